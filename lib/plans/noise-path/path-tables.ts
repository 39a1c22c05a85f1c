// A room's noise as tables a person reads: per outlet, the fan's sound power, each element's loss and
// the power into the room; per listener, each outlet's room correction and level, their energy sum,
// the criterion curve and the margin. The same rows serve the room panel, the revision and the PDF
// schedule; lengths in a row's words are given in SI and in imperial units, for each reader's choice.
import { OCTAVE_BANDS_HZ } from '@/lib/acoustic';
import { formatLength, type UnitSystem } from '@/lib/plan/units';
import type { PathElementSource } from './derive-path';
import type { RoomNoise } from './room-noise';

export type PathRowRole = 'fan' | 'fan-speed' | 'step' | 'into-room' | 'correction' | 'contribution' | 'listener' | 'criterion' | 'margin';

export interface PathRow {
  role: PathRowRole;
  /** An element's place on the plan (its segment or point), for highlighting it there. */
  segmentId?: string | null;
  nodeId?: string | null;
  /** In SI. */
  label: string;
  /** The same words with imperial lengths, where the row has a length in it. */
  labelImperial?: string;
  /** What the row is, in a word or two ("Duct", "Room correction"); absent in tables frozen before it. */
  element?: string;
  /** Where on the plan the row belongs, in the plan's labels ("A2", "A2/A3 elbow", "Outlet A3 end"); absent in tables frozen before it. */
  source?: string;
  valuesDb: number[];
  total?: boolean;
}

export interface OutletTable {
  outletId: string;
  label: string;
  runName: string;
  rows: PathRow[];
}

export interface ListenerTable {
  listenerId: string;
  name: string;
  rows: PathRow[];
  nc: number;
  nr: number;
  dba: number;
  governingHz: number;
}

export interface NoiseTables {
  correction: RoomNoise['correction'];
  criterionNc: number;
  outlets: OutletTable[];
  listeners: ListenerTable[];
  worstListenerId: string;
  schroederHz: number;
  bandsBelowSchroederHz: number[];
  warnings: string[];
}

const ELEMENT_WORDS: Record<string, string> = { duct: 'Duct', elbow: 'Elbow', split: 'Branch split', plenum: 'Plenum', silencer: 'Silencer', outlet: 'Outlet (end reflection)', loss: 'Loss' };
const CORRECTION_WORDS = { furnished: "Schultz's relation, furnished room", bare: 'room equation, bare room' } as const;

export function bandWords(hz: number): string {
  return hz >= 1000 ? `${hz / 1000} kHz` : `${hz} Hz`;
}

/** A duct's words in the given units ("A2, 19 ft 8 1/4 in, lined 2 in"); any other element's as read off the plan. */
export function sourceWords(source: PathElementSource, units: UnitSystem): string {
  if (source.place === undefined || source.lengthM === undefined) return source.label;
  const lining = source.liningThicknessM !== undefined ? `, lined ${formatLength(source.liningThicknessM, units, 'section')}` : '';
  return `${source.place}, ${formatLength(source.lengthM, units, 'run')}${lining}`;
}

/** The row's words for a reader who uses these units. */
export function rowWords(row: PathRow, units: UnitSystem): string {
  return units === 'imperial' && row.labelImperial ? row.labelImperial : row.label;
}

function twoWays(words: (units: UnitSystem) => string): Pick<PathRow, 'label' | 'labelImperial'> {
  const label = words('si');
  const labelImperial = words('imperial');
  return labelImperial === label ? { label } : { label, labelImperial };
}

function outletTable(outlet: RoomNoise['outlets'][number]): OutletTable {
  const rows: PathRow[] = [];
  const fanSource = `Fan of ${outlet.runName}`;
  if (outlet.fanSpeed) {
    const { ratedRpm, worstRpm, changeDb } = outlet.fanSpeed;
    rows.push({ role: 'fan', element: 'Fan', source: fanSource, label: `Fan sound power as given, at ${ratedRpm} rpm (dB re 1 pW)`, valuesDb: outlet.fanSoundPowerDb });
    rows.push({ role: 'fan-speed', element: 'Fan speed', source: fanSource, label: `Fan at ${worstRpm} rpm, the top of its range: 50 log(${worstRpm}/${ratedRpm}) by the fan laws`, valuesDb: OCTAVE_BANDS_HZ.map(() => changeDb) });
    rows.push({ role: 'fan', element: 'Fan', source: fanSource, label: `Fan sound power at ${worstRpm} rpm (dB re 1 pW)`, valuesDb: outlet.startPowerDb, total: true });
  } else {
    rows.push({ role: 'fan', element: 'Fan', source: fanSource, label: 'Fan sound power (dB re 1 pW)', valuesDb: outlet.fanSoundPowerDb, total: true });
  }
  outlet.steps.forEach((step, index) => {
    const source = outlet.sources[index];
    rows.push({ role: 'step', element: ELEMENT_WORDS[step.kind] ?? step.kind, source: source ? source.place ?? source.label : '', ...twoWays((units) => `${ELEMENT_WORDS[step.kind] ?? step.kind}: ${source ? sourceWords(source, units) : ''} (loss)`), valuesDb: step.lossDb.map((loss) => -loss), segmentId: source?.segmentId ?? null, nodeId: source?.nodeId ?? null });
  });
  rows.push({ role: 'into-room', element: 'Into the room', source: outlet.label, label: 'Sound power into the room (dB re 1 pW)', valuesDb: outlet.powerIntoRoomDb, total: true });
  return { outletId: outlet.outletId, label: outlet.label, runName: outlet.runName, rows };
}

function listenerTable(noise: RoomNoise, listener: RoomNoise['listeners'][number]): ListenerTable {
  const labels = new Map(noise.outlets.map((outlet) => [outlet.outletId, outlet.label]));
  const several = listener.contributions.length > 1;
  const rows: PathRow[] = listener.contributions.flatMap((part): PathRow[] => {
    const from = labels.get(part.outletId) ?? 'Outlet';
    // the method is stated once above the tables (correctionWords)
    const correction: PathRow = { role: 'correction', element: 'Room correction', source: `${from} to ${listener.name}`, ...twoWays((units) => `${several ? `${from}, ` : 'Outlet '}${formatLength(part.distanceM, units, 'run')} away: room correction (Lp − Lw)`), valuesDb: part.roomCorrectionDb };
    return several ? [correction, { role: 'contribution', element: 'Outlet level', source: `${from} at ${listener.name}`, label: `${from}: level at ${listener.name}`, valuesDb: part.levelDb }] : [correction];
  });
  rows.push({ role: 'listener', element: 'Level', source: listener.name, label: `Level at ${listener.name}${several ? ', energy sum of the outlets' : ''} (dB re 20 µPa)`, valuesDb: listener.levelDb, total: true });
  rows.push({ role: 'criterion', element: 'Criterion', source: '', label: `Criterion curve, NC-${noise.criterionNc}`, valuesDb: noise.criterionDb });
  rows.push({ role: 'margin', element: 'Margin', source: listener.name, label: 'Margin (criterion − level; negative is above)', valuesDb: listener.marginDb, total: true });
  return { listenerId: listener.listenerId, name: listener.name, rows, nc: listener.nc, nr: listener.nr, dba: listener.dba, governingHz: listener.governingHz };
}

export function noiseTables(noise: RoomNoise): NoiseTables {
  return {
    correction: noise.correction,
    criterionNc: noise.criterionNc,
    outlets: noise.outlets.map(outletTable),
    listeners: noise.listeners.map((listener) => listenerTable(noise, listener)),
    worstListenerId: noise.worstListenerId,
    schroederHz: noise.schroederHz,
    bandsBelowSchroederHz: [...noise.bandsBelowSchroederHz],
    warnings: [...noise.warnings],
  };
}

/** "NC 24 · NR 21.3 · 30.2 dB(A); the 500 Hz band governs". */
export function ratingWords(table: Pick<ListenerTable, 'nc' | 'nr' | 'dba' | 'governingHz'>): string {
  return `NC ${table.nc.toFixed(0)} · NR ${table.nr.toFixed(1)} · ${table.dba.toFixed(1)} dB(A); the ${bandWords(table.governingHz)} band governs`;
}

/** "Schultz's relation, furnished room" or "room equation, bare room". */
export function correctionWords(correction: RoomNoise['correction']): string {
  return CORRECTION_WORDS[correction];
}
