// Physical limits on the engine's input (product rules, no published source). Each is chosen to be
// generous for the ductwork and rooms of real buildings, and to keep what one input can ask of
// the server bounded: the work of a run analysis grows with the number of resonances in its
// range, about 2 · (duct length) · (frequency range) / c, and that of a room with its modes.

/** Supply air from an unheated intake in a cold climate to warm-air heating, °C. */
export const MIN_AIR_TEMPERATURE_C = -40;
export const MAX_AIR_TEMPERATURE_C = 60;

/** One straight segment, m: a straight duct of a few hundred metres is already a long corridor or a tunnel. */
export const MAX_SEGMENT_LENGTH_M = 500;

/** All the duct of one run, branches included, m: a supply run rarely exceeds a few hundred metres along its path. */
export const MAX_RUN_LENGTH_M = 2000;

/** Segments of one run, branches included. */
export const MAX_RUN_SEGMENTS = 2000;

/** Branches within branches, levels deep. */
export const MAX_BRANCH_DEPTH = 20;

/** Largest diameter, width or height of a section, m: beyond the largest plenums and shafts. */
export const MAX_SECTION_DIMENSION_M = 10;

/** Thickest duct lining, m (liners are 25 to 100 mm). */
export const MAX_LINING_THICKNESS_M = 1;

/** Top of the frequency range, Hz: the upper limit of hearing. */
export const MAX_ANALYSIS_HZ = 20000;

/**
 * maxHz at most this multiple of the run's plane-wave cut-off. Between the cut-off and this multiple
 * the analysis runs with a warning; at twice the cut-off of a round duct the (2,1) and (0,1) modes
 * propagate as well (Bessel zeros 1.841, 3.054, 3.832), so the plane-wave model means nothing there.
 */
export const MAX_HZ_PER_CUTOFF = 2;

/**
 * Resonances one analysis may list, estimated as 2 · (duct length, branches included) · (maxHz - minHz) / c.
 * 2000 covers a 300 m run of 200 mm duct up to its cut-off, or a 1 km distribution tree whose largest
 * duct is 600 mm; beyond that the resonances overlap and a list of them says little.
 */
export const MAX_RESONANCES = 2000;

/** Echo arrivals one analysis may list (default 40). */
export const MAX_ECHOES = 500;

/** Length and width of a room, m: a large exhibition hall. */
export const MAX_ROOM_SIDE_M = 200;

/** Height of a room, m: a tall atrium. */
export const MAX_ROOM_HEIGHT_M = 50;

/**
 * Mode index combinations one room-mode list may try (the modes found are about half of them): a 20 × 15 × 5 m
 * room up to 500 Hz tries about 39 000.
 */
export const MAX_ROOM_MODE_CANDIDATES = 200000;

/** Reflections an image-source model of a room goes up to (the images grow with the cube of the order). */
export const MAX_IMAGE_ORDER = 10;

/** Fan: blades and speed. Centrifugal fans have up to about 64 blades; HVAC fans turn below about 6000 rpm. */
export const MAX_FAN_BLADES = 100;
export const MAX_FAN_RPM = 10000;
/** Blade-pass harmonics checked against resonances. */
export const MAX_FAN_HARMONICS = 20;
