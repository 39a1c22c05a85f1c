// Full analysis of a room served by a run's outlet: modes, statistical quantities per octave band,
// image sources at the listener, the outlet's boundary gain and the first comb-filter notch.
import { OCTAVE_BANDS_HZ } from '../constants';
import { requireAbove } from '../input-error';
import { roomModes } from '../room-modes';
import type { RoomMode } from '../types';
import { boundaryGain, type BoundaryGain } from './boundary-gain';
import { imageSources, type ImageSource } from './image-sources';
import { modalDensityPerHz, roomBands, roomGeometry, roomSpeedOfSound, schroederFrequencyHz, type RoomBand } from './room-acoustics';
import { highestListableModeHz, requireListableModes } from './room-box';
import { validateRoomInput, type RoomInput } from './room-input';
import { firstCombNotchHz } from './room-level';

/** Mid-frequency bands whose mean T60 gives the Schroeder frequency: 500 Hz and 1 kHz (common practice, from memory). */
const MID_FREQUENCY_BANDS_HZ = [500, 1000];

/**
 * Images closer than this to the direct path length, m, coincide with the source (it sits on that
 * surface): that is its boundary gain, not a separate arrival, and makes no comb filter.
 */
const COINCIDENT_IMAGE_M = 1e-3;

export interface RoomAnalysisOptions {
  /**
   * Modes up to this frequency, Hz (default: twice the Schroeder frequency, at least 100 Hz, and no
   * higher than a list of the room's modes may go: see MAX_ROOM_MODE_CANDIDATES).
   */
  maxModeHz?: number;
  /** Image sources up to this many reflections (default 2, at most MAX_IMAGE_ORDER). */
  imageOrder?: number;
}

export interface RoomAnalysis {
  volumeM3: number;
  surfaceM2: number;
  speedOfSoundMps: number;
  bands: RoomBand[];
  /** Mean Sabine T60 of the 500 Hz and 1 kHz bands, s. */
  midReverberationTimeS: number;
  schroederHz: number;
  /** Asymptotic modal density at the Schroeder frequency, modes per Hz. */
  modalDensityAtSchroederPerHz: number;
  modes: RoomMode[];
  /** Direct sound first, then image sources by delay. */
  images: ImageSource[];
  /** The reflection with the highest energy mean level over the bands (images coinciding with the source left out). */
  strongestReflection: ImageSource | null;
  /** First comb-filter notch from the strongest reflection's path difference, Hz. */
  firstCombNotchHz: number | null;
  outletBoundaryGain: BoundaryGain;
}

const energyMeanDb = (levelsDb: number[]): number => 10 * Math.log10(levelsDb.reduce((sum, levelDb) => sum + 10 ** (levelDb / 10), 0) / levelsDb.length);

export function analyzeRoom(input: RoomInput, options: RoomAnalysisOptions = {}): RoomAnalysis {
  const room = validateRoomInput(input);
  const { volumeM3, surfaceM2 } = roomGeometry(room.box);
  const speedOfSoundMps = roomSpeedOfSound(room.box);
  const bands = roomBands(room.box, room.surfaces, OCTAVE_BANDS_HZ);
  const midBands = bands.filter((band) => MID_FREQUENCY_BANDS_HZ.includes(band.hz));
  const midReverberationTimeS = midBands.reduce((sum, band) => sum + band.reverberationTimeS, 0) / midBands.length;
  const schroederHz = Number.isFinite(midReverberationTimeS) ? schroederFrequencyHz(midReverberationTimeS, volumeM3) : Infinity;
  const defaultModeHz = Math.max(100, Number.isFinite(schroederHz) ? 2 * schroederHz : 100);
  const maxModeHz = options.maxModeHz ?? Math.min(defaultModeHz, highestListableModeHz(room.box, speedOfSoundMps));
  requireAbove(maxModeHz, 0, 'maxModeHz');
  requireListableModes(room.box, maxModeHz, speedOfSoundMps, 'maxModeHz');
  const images = imageSources(room.box, room.surfaces, room.outlet, room.listener, options.imageOrder ?? 2);
  const direct = images.find((image) => image.order === 0);
  const directM = direct?.distanceM ?? 0;
  let strongestReflection: ImageSource | null = null;
  for (const image of images) {
    if (image.order === 0 || image.distanceM - directM < COINCIDENT_IMAGE_M) continue;
    if (strongestReflection === null || energyMeanDb(image.relativeLevelDb) > energyMeanDb(strongestReflection.relativeLevelDb)) strongestReflection = image;
  }
  const pathDifferenceM = strongestReflection ? strongestReflection.distanceM - directM : 0;
  return {
    volumeM3,
    surfaceM2,
    speedOfSoundMps,
    bands,
    midReverberationTimeS,
    schroederHz,
    modalDensityAtSchroederPerHz: Number.isFinite(schroederHz) ? modalDensityPerHz(room.box, schroederHz) : Infinity,
    modes: roomModes(room.box, maxModeHz),
    images,
    strongestReflection,
    firstCombNotchHz: pathDifferenceM > 0 ? firstCombNotchHz(pathDifferenceM, speedOfSoundMps) : null,
    outletBoundaryGain: boundaryGain(room.box, room.outlet),
  };
}
