// The fixed words of every treatment schedule: limits of the model, cautions, methods.
export const ASSUMPTIONS = [
  'Sound in each duct run is treated as plane waves travelling both ways. The results hold below the plane-wave cut-off of the largest section, given for each run; above it, cross-modes carry sound and these figures no longer apply.',
  'The speed of sound follows the air temperature entered for each run (listed with the run). Other temperatures move every resonance in proportion to the square root of absolute temperature.',
  'Lengths are measured on the drawing at the scale set on the plan, or taken from lengths typed in; fittings are treated as sudden changes of section, and tees as junctions of the connected ducts with the mass of air in each branch mouth.',
  'Wall losses are the visco-thermal losses of smooth rigid walls; flexible or perforated walls, duct breakout and flow noise are not modelled.',
  'Predicted treatment effects are estimates for the listed frequencies only; they are not measurements and should be confirmed on site.',
];

export const CAUTIONS = [
  'Duct linings and absorptive treatments must carry the fire and smoke rating required where they are installed. Check the product against local codes before it is specified.',
  'Added linings, attenuators and mass add weight: supports and fixings need checking by the responsible structural or mechanical engineer.',
  'Where plant rooms or ducts expose people to high noise, occupational noise limits apply; this schedule does not assess exposure.',
  'This schedule supports the design team. It does not replace local codes, standards or the judgement of licensed practitioners, who remain responsible for the installed work.',
];

export const METHODS = [
  'Speed of sound in air: ISO 9613-1 (1993), annex A.',
  'End corrections and reflection at open ends: Norris and Sheng (1989), J. Sound Vib. 135, 85 (flanged); Dalmont and Nederveen (2001), J. Sound Vib. 244 (unflanged).',
  'Reflections at changes of section and junctions: a scattering lattice after Goupillaud (1961), Geophysics 26, 754, generalised to junctions of several ducts.',
  'Mass of a side-branch mouth at a tee: Dubos, Kergomard, Khettabi, Dalmont, Keefe and Nederveen (1999), Acta Acustica 85, 153.',
  'Attenuation of lined ducts: Sabine (1940), J. Acoust. Soc. Am. 12, 53.',
  'End reflection loss of outlets: ASHRAE research project RP-1314 (2007).',
  'Room modes and image sources: Allen and Berkley (1979), J. Acoust. Soc. Am. 65, 943; boundary gain after Waterhouse (1955), J. Acoust. Soc. Am. 27.',
  'Noise criterion curves: ANSI S12.2 (2008).',
];
