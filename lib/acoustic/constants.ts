// Shared numeric constants of the acoustic engine, each with its source.

/** 0 °C in kelvin. SI definition (BIPM, SI Brochure, 9th ed., 2019). */
export const ZERO_CELSIUS_K = 273.15;

/** Reference temperature of ISO 9613-1 (1993), 20 °C, in kelvin. */
export const ISO_9613_REFERENCE_TEMPERATURE_K = 293.15;

/** Speed of sound in dry air at 20 °C, ISO 9613-1 (1993), eq. (A.3) reference value, m/s. */
export const ISO_9613_REFERENCE_SPEED_OF_SOUND_MPS = 343.2;

/** Standard atmospheric pressure, ISO 2533 (1975), Pa. */
export const STANDARD_PRESSURE_PA = 101325;

/** Specific gas constant of dry air, J/(kg·K). ISO 2533 (1975) gives 287.05287 (value rounded, from memory). */
export const DRY_AIR_GAS_CONSTANT_J_PER_KG_K = 287.05;

/** Ratio of specific heats of air (Kinsler & Frey, Fundamentals of Acoustics, 4th ed., appendix A10). */
export const AIR_HEAT_CAPACITY_RATIO = 1.4;

/** Prandtl number of air near 20 °C (Kinsler & Frey, Fundamentals of Acoustics, 4th ed., appendix A10). */
export const AIR_PRANDTL_NUMBER = 0.71;

/** Sutherland's law reference viscosity of air at 273.15 K, Pa·s (White, Viscous Fluid Flow, 3rd ed., Table 1-2; from memory). */
export const SUTHERLAND_REFERENCE_VISCOSITY_PA_S = 1.716e-5;

/** Sutherland's law reference temperature, K (White, Viscous Fluid Flow, 3rd ed., Table 1-2; from memory). */
export const SUTHERLAND_REFERENCE_TEMPERATURE_K = 273.15;

/** Sutherland constant of air, K (White, Viscous Fluid Flow, 3rd ed., Table 1-2; from memory). */
export const SUTHERLAND_CONSTANT_K = 110.4;

/** First zero of the Bessel derivative J1'(x): cut-off of the (1,1) mode in a round duct (Abramowitz & Stegun, Table 9.5). */
export const BESSEL_J1_PRIME_FIRST_ZERO = 1.84118;

/** Low-frequency end correction of an unflanged pipe, times the radius: Levine & Schwinger (1948), Phys. Rev. 73, 383. */
export const UNFLANGED_END_CORRECTION_PER_RADIUS = 0.6133;

/** Low-frequency end correction of a pipe in an infinite flange, times the radius: Norris & Sheng (1989), J. Sound Vib. 135, 85. */
export const FLANGED_END_CORRECTION_PER_RADIUS = 0.8216;

/** Smallest section dimension (diameter, width or height) the engine accepts, m. Product rule. */
export const MIN_SECTION_DIMENSION_M = 0.01;

/** Defaults of RunInput (engine contract). */
export const DEFAULT_TEMPERATURE_C = 20;
export const DEFAULT_MIN_HZ = 20;
export const DEFAULT_MAX_HZ = 2000;

/** Nominal octave-band centre frequencies from 63 Hz to 8 kHz (IEC 61260-1 (2014), Annex E nominal values). */
export const OCTAVE_BANDS_HZ: readonly number[] = [63, 125, 250, 500, 1000, 2000, 4000, 8000];

/** Decibels per neper for amplitude: 20 / ln 10 (definition of the neper, ISO 80000-3). */
export const DB_PER_NEPER = 20 / Math.LN10;

/** Sabine's lined-duct attenuation coefficient in 1.05·α^1.4·P/S dB/m (Sabine 1940; 12.6 dB/ft with P/S in 1/in; from memory). */
export const SABINE_LINED_DUCT_COEFFICIENT_DB = 1.05;

/** Sabine's lined-duct absorption exponent (Sabine 1940; from memory). */
export const SABINE_LINED_DUCT_ABSORPTION_EXPONENT = 1.4;

/** End reflection loss coefficients a1 (flush, free) and a2 (ASHRAE RP-1314, 2007; from memory). */
export const END_REFLECTION_LOSS_A1_FLUSH = 0.7;
export const END_REFLECTION_LOSS_A1_FREE = 1.0;
export const END_REFLECTION_LOSS_A2 = 2;

/** Schroeder frequency coefficient in f_s = 2000 sqrt(T60 / V), Hz·sqrt(m³/s) (Schroeder & Kuttruff (1962), JASA 34, 76, from memory; Kuttruff, Room Acoustics, ch. 3). */
export const SCHROEDER_COEFFICIENT = 2000;

/** Sabine's constant in T60 = 0.161 V / A, s/m, metric form for air near 20 °C (W. C. Sabine, 1900; Kuttruff, Room Acoustics, ch. 5). */
export const SABINE_CONSTANT_S_PER_M = 0.161;

/** Directivity factor of a source on one, two or three reflecting planes: 2, 4, 8 (Long, Architectural Acoustics, 2nd ed., ch. 2). */
export const DIRECTIVITY_PER_REFLECTING_PLANE = 2;

/** sin(x)/x = 1/2 at x = 1.8955 (the first crossing; computed from the function, no source needed). */
export const BOUNDARY_HALF_CONTRIBUTION_KD = 1.895494267033981;

/** A-weighting at the octave bands 63 Hz to 8 kHz, dB: IEC 61672-1 (2013), Table 3. */
export const A_WEIGHTING_OCTAVE_DB: readonly number[] = [-26.2, -16.1, -8.6, -3.2, 0, 1.2, 1.0, -1.1];

/** The supply air's temperature swings this much either side of the run's temperature, °C, unless stated (product rule). */
export const DEFAULT_TEMPERATURE_SWING_C = 5;
/** A belt-driven fan with no speed range entered runs this much either side of its speed, percent (belt slip; common practice, no source). */
export const DEFAULT_SPEED_SLIP_PERCENT = 2;
/** Flag severity by the dB a run adds at a tone over its smooth response: low, medium, high (product rule). */
export const GAIN_LOW_DB = 3;
export const GAIN_MEDIUM_DB = 6;
export const GAIN_HIGH_DB = 10;
/**
 * A resonance with Q below this, or whose bandwidth reaches its neighbour, is not a resonance to dodge:
 * the run responds broadly there (product rule).
 */
export const BROADBAND_Q = 5;

/**
 * A point is near an axial mode's pressure maximum within this fraction of the mode's wavelength:
 * within lambda/8 of x = mL/n, |cos(n pi x / L)| >= cos(pi/4), i.e. within 3 dB of the maximum (product rule).
 */
export const DEFAULT_NEAR_MAXIMUM_WAVELENGTHS = 1 / 8;

/** Reference sound power for levels in dB, W (ISO 80000-8 / ISO 3744). Levels are given in dB re this value. */
export const REFERENCE_SOUND_POWER_W = 1e-12;

/** The international foot, m (International Yard and Pound Agreement, 1959). */
export const FOOT_M = 0.3048;

/** The international inch, m (International Yard and Pound Agreement, 1959). */
export const INCH_M = 0.0254;

/**
 * Largest attenuation credited to one lined or unlined duct run in any band, dB: beyond about 40 dB the
 * sound that breaks out of the duct and back in, or travels along its walls, sets the level instead
 * (common practice, no source).
 */
export const DUCT_FLANKING_CAP_DB = 40;

/**
 * Schultz's room correction Lp - Lw = 25 - 10 log r - 5 log V - 3 log f (r in ft, V in ft³, f in Hz):
 * its constant and coefficients (Schultz (1985), ASHRAE Transactions 91(1); as in the ASHRAE Handbook,
 * HVAC Applications, noise and vibration chapter).
 */
export const SCHULTZ_CONSTANT_DB = 25;
export const SCHULTZ_DISTANCE_COEFFICIENT_DB = 10;
export const SCHULTZ_VOLUME_COEFFICIENT_DB = 5;
export const SCHULTZ_FREQUENCY_COEFFICIENT_DB = 3;
