// What a duct's walls do to sound travelling along it (engine contract: "real duct walls").

export type Wall =
  | { kind: 'rigid' }                                    // air (Kirchhoff) losses only: the ideal, sharpest case
  | { kind: 'sheet-metal' }                              // unlined galvanised sheet metal: measured attenuation per
                                                         // octave band for the section's shape and size (published tables)
  | { kind: 'measured'; attenuationDbPerM: number[] };   // the user's figures, octave bands 63..8000 Hz
