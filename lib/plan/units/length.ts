// Lengths typed in any unit ("300 mm", "12 in", "1 ft 6 in", "1' 6\"", "6 1/2 in"), read with mathjs units,
// and lengths shown in SI or imperial. Inside the model everything is metres.
// A comma is a decimal separator ("1,5 m" = 1.5 m); a comma followed by exactly three digits
// ("1,500") is refused as ambiguous, and so is a text with both a comma and a point. Digits may
// be grouped in threes with a plain, thin or no-break space ("10 000 mm", "10\u2009000 mm").
import { unit as mathUnit } from 'mathjs';

export type LengthUnit = 'm' | 'mm' | 'ft' | 'in';
export type UnitSystem = 'si' | 'imperial';
export type LengthKind = 'run' | 'section';

export interface ParseLengthOptions {
  /** The unit of a bare number ("2.5"). */
  defaultUnit: LengthUnit;
  /** Accept 0 (lengths are otherwise refused unless more than zero). */
  allowZero?: boolean;
}

export type ParsedLength = { ok: true; valueM: number; understood: string } | { ok: false; message: string };

/** Results are rounded to the picometre, so exact definitions (1 in = 0.0254 m) come out exact. */
const METRE_DECIMALS = 12;

const UNIT_ALIASES: Readonly<Record<string, string>> = {
  '"': 'in', "'": 'ft', metre: 'm', metres: 'm', meters: 'm', millimetre: 'mm', millimetres: 'mm', millimeters: 'mm', centimetre: 'cm', centimetres: 'cm', centimeters: 'cm',
};
const METRIC_UNITS = new Set(['m', 'mm', 'cm']);
const FOOT_UNITS = new Set(['ft', 'foot', 'feet']);

interface Term {
  value: number;
  text: string;
  unit: string | null;
}

// A number ("12", "2.5", ".5", "6 1/2", "1/4") then an optional unit (letters, " or ').
const TERM = /^\s*(?:(\d+)\s+(\d+)\/(\d+)|(\d+)\/(\d+)|(\d+(?:\.\d*)?|\.\d+))\s*([a-zµ]+|"|')?/;

function readTerms(text: string): Term[] | string {
  const terms: Term[] = [];
  let rest = text;
  while (rest.trim() !== '') {
    const match = TERM.exec(rest);
    if (!match) return `"${rest.trim()}" is not a number`;
    const [whole, mixedWhole, mixedTop, mixedBottom, top, bottom, decimal, unitText] = match;
    let value: number;
    if (mixedWhole !== undefined) value = Number(mixedWhole) + Number(mixedTop) / Number(mixedBottom);
    else if (top !== undefined) value = Number(top) / Number(bottom);
    else value = Number(decimal);
    if (!Number.isFinite(value)) return `"${whole.trim()}" is not a number`;
    terms.push({ value, text: whole.replace(/\s*([a-zµ]+|"|')?$/, '').trim(), unit: unitText ?? null });
    rest = rest.slice(whole.length);
  }
  return terms;
}

// Groups of three digits after a space of any width ("10 000", "1 250 000"), not a fraction ("6 1/2").
const DIGIT_GROUPS = /(^|[^\d.,])(\d{1,3}(?:[ \u00a0\u2009\u202f]\d{3})+)(?![\d/])/g;

function joinDigitGroups(text: string): string {
  return text.replace(DIGIT_GROUPS, (_match, before: string, grouped: string) => `${before}${grouped.replace(/[ \u00a0\u2009\u202f]/g, '')}`);
}

function normalise(text: string): string | { message: string } {
  let result = joinDigitGroups(text.trim().toLowerCase().replace(/[″“”]/g, '"').replace(/[′’‘]/g, "'").replace(/\u2212/g, '-'));
  if (result === '') return { message: 'Type a length, for example 300 mm, 2.5 m, 12 in or 1 ft 6 in.' };
  if (/^-|\s-\s*\d/.test(result)) return { message: 'A length cannot be negative.' };
  if (result.includes(',')) {
    if (result.includes('.')) return { message: `"${text.trim()}": use a comma or a point for decimals, not both.` };
    if (/\d,\d{3}(?!\d)/.test(result)) return { message: `"${text.trim()}" could mean a thousand times more or less; write it without the comma, or with a point.` };
    result = result.replace(/(\d),(\d)/g, '$1.$2');
  }
  return result;
}

function formatNumber(value: number, maxDecimals: number): string {
  return String(Number(value.toFixed(maxDecimals)));
}

/** The value in SI as a person would say it: mm below 1 m, otherwise m. */
function describeSi(valueM: number): string {
  return valueM < 1 ? `${formatNumber(valueM * 1000, 2)} mm` : `${formatNumber(valueM, 4)} m`;
}

/** The unit a bare number is read in: SI sections mm, runs m; imperial sections in, runs ft. */
export function defaultLengthUnit(system: UnitSystem, kind: LengthKind): LengthUnit {
  if (system === 'si') return kind === 'section' ? 'mm' : 'm';
  return kind === 'section' ? 'in' : 'ft';
}

export function parseLength(text: string, options: ParseLengthOptions): ParsedLength {
  const normalised = normalise(text);
  if (typeof normalised !== 'string') return { ok: false, message: normalised.message };
  const terms = readTerms(normalised);
  if (typeof terms === 'string') return { ok: false, message: `${terms}; type a length such as 300 mm or 12 in.` };
  let totalM = 0;
  const parts: string[] = [];
  let previousUnit: string | null = null;
  for (const [index, term] of terms.entries()) {
    let unitName = term.unit === null ? null : UNIT_ALIASES[term.unit] ?? term.unit;
    if (unitName === null) {
      if (terms.length === 1) unitName = options.defaultUnit;
      else if (index === terms.length - 1 && previousUnit !== null && FOOT_UNITS.has(previousUnit)) unitName = 'in';
      else return { ok: false, message: `"${term.text}" needs a unit, for example ${term.text} mm or ${term.text} in.` };
    }
    let valueM: number;
    try {
      const parsed = mathUnit(term.value, unitName);
      if (!parsed.equalBase(mathUnit(1, 'm'))) return { ok: false, message: `"${term.unit}" is not a unit of length; use mm, m, in or ft.` };
      valueM = parsed.toNumber('m');
    } catch {
      return { ok: false, message: `"${term.unit ?? unitName}" is not a unit we know; use mm, m, in or ft.` };
    }
    totalM += valueM;
    parts.push(`${term.text} ${unitName}`);
    previousUnit = unitName;
  }
  const valueM = Number(totalM.toFixed(METRE_DECIMALS));
  if (valueM === 0 && !options.allowZero) return { ok: false, message: 'A length must be more than zero.' };
  const said = parts.join(' ');
  const understood = parts.length === 1 && METRIC_UNITS.has(parts[0].split(' ')[1]) ? said : `${said} (${describeSi(valueM)})`;
  return { ok: true, valueM, understood };
}

const METRES_PER_INCH = 0.0254;
const QUARTERS_PER_FOOT = 48;
const FRACTIONS = ['', ' 1/4', ' 1/2', ' 3/4'];
/** 0.001 in = 0.0254 mm: within 0.013 mm, so 0.1 mm shown in SI comes back unchanged. */
const SECTION_INCH_DECIMALS = 3;

/** Feet and inches to the nearest 1/4 in: "12 ft 3 1/4 in", "6 1/2 in" under a foot. */
function feetAndInches(valueM: number): string {
  const quarters = Math.round((valueM / METRES_PER_INCH) * 4);
  const feet = Math.floor(quarters / QUARTERS_PER_FOOT);
  const remainder = quarters - feet * QUARTERS_PER_FOOT;
  const inches = `${Math.floor(remainder / 4)}${FRACTIONS[remainder % 4]} in`;
  return feet === 0 ? inches : `${feet} ft ${inches}`;
}

/**
 * SI: run lengths in m with 2 decimals, sections in mm (to 0.1 mm).
 * Imperial: run lengths in ft-in to the nearest 1/4 in, sections in inches to 0.001 in, so a
 * whole millimetre shown in inches reads back to the same millimetre (23.622 in, not 23.62 in).
 */
export function formatLength(valueM: number, system: UnitSystem, kind: LengthKind): string {
  if (!Number.isFinite(valueM)) return '—';
  if (system === 'si') return kind === 'run' ? `${valueM.toFixed(2)} m` : `${formatNumber(valueM * 1000, 1)} mm`;
  return kind === 'run' ? feetAndInches(valueM) : `${formatNumber(valueM / METRES_PER_INCH, SECTION_INCH_DECIMALS)} in`;
}

/** Readings closer than this, relative, are the same length (rounding of the shown digits only). */
const SAME_READING_RELATIVE = 1e-9;

/**
 * What a length field keeps when the person commits text: the value it holds when the text reads
 * as exactly the value already shown (retyping "23.622 in" leaves 600 mm exactly 600 mm), else the
 * reading ("9 ft 10 in" over a shown "3.00 m" is 2.9972 m, though both show as 3.00 m).
 */
export function keptLength(readM: number, currentM: number | null, system: UnitSystem, kind: LengthKind): number {
  if (currentM === null) return readM;
  const shown = parseLength(formatLength(currentM, system, kind), { defaultUnit: defaultLengthUnit(system, kind) });
  if (!shown.ok) return readM;
  return Math.abs(readM - shown.valueM) <= SAME_READING_RELATIVE * Math.max(Math.abs(readM), 1e-12) ? currentM : readM;
}
