// An independent, slow reference for the duct-network model, written directly from the published
// formulas with mathjs complex numbers and 2x2 matrices. Used only by tests.
import { complex, multiply, matrix, type Complex, type Matrix, add, subtract, divide, exp, sin, cos, sqrt, abs } from 'mathjs';
import type { RunInput, Section, Segment, Termination } from '@/lib/acoustic';

export interface OracleAir {
  speedMps: number;
  densityKgM3: number;
  viscosityPaS: number;
}

export function oracleAir(temperatureC: number): OracleAir {
  const kelvin = temperatureC + 273.15;
  return {
    // ISO 9613-1 (1993) reference form
    speedMps: 343.2 * Math.sqrt(kelvin / 293.15),
    // ideal gas, R = 287.05 J/(kg K)
    densityKgM3: 101325 / (287.05 * kelvin),
    // Sutherland (1893) with mu0 = 1.716e-5 Pa s at 273.15 K, S = 110.4 K
    viscosityPaS: 1.716e-5 * (kelvin / 273.15) ** 1.5 * (383.55 / (kelvin + 110.4)),
  };
}

const area = (section: Section) => (section.shape === 'round' ? (Math.PI * section.diameterM ** 2) / 4 : section.widthM * section.heightM);
const perimeter = (section: Section) => (section.shape === 'round' ? Math.PI * section.diameterM : 2 * (section.widthM + section.heightM));
const radius = (section: Section) => Math.sqrt(area(section) / Math.PI);
const c = (re: number, im = 0): Complex => complex(re, im);

/**
 * Inner length correction of a side branch's mouth: Dubos et al. (1999), Acta Acustica 85, 153 (from memory),
 * t_i = b (0.82 - 0.193 d - 1.09 d^2 + 1.27 d^3 - 0.71 d^4), d = b / a taken at most 1.
 */
export function mouthCorrection(branch: Section, host: Section): number {
  const b = radius(branch);
  const d = Math.min(1, b / radius(host));
  return b * (0.82 - 0.193 * d - 1.09 * d ** 2 + 1.27 * d ** 3 - 0.71 * d ** 4);
}

/** Reflection coefficient of a termination at complex frequency (Dalmont & Nederveen 2001; Norris & Sheng 1989). */
export function oracleReflection(termination: Termination, frequencyHz: Complex, radiusM: number, speedMps: number): Complex {
  if (termination.kind === 'closed') return c(1);
  if (termination.kind === 'anechoic') return c(0);
  if (termination.kind === 'lined') return c(Math.sqrt(1 - termination.absorption));
  const ka = multiply(frequencyHz, (2 * Math.PI * radiusM) / speedMps) as Complex;
  const ka2 = multiply(ka, ka) as Complex;
  let magnitude: Complex;
  let endCorrectionPerRadius: Complex;
  if (termination.flange === 'unflanged') {
    magnitude = divide(add(subtract(c(1), multiply(ka2, 0.084)), multiply(ka, 0.2)), add(add(c(1), multiply(ka, 0.2)), multiply(ka2, 0.416))) as Complex;
    const s = sin(multiply(ka, 2) as Complex);
    const ratio = divide(add(c(1), multiply(ka2, 0.044)), add(c(1), multiply(ka2, 0.19))) as Complex;
    endCorrectionPerRadius = multiply(subtract(ratio, multiply(multiply(s, s), 0.02)), 0.6133) as Complex;
  } else {
    magnitude = divide(add(subtract(c(1), multiply(ka2, 0.077)), multiply(ka, 0.323)), add(add(c(1), multiply(ka, 0.323)), multiply(ka2, 0.923))) as Complex;
    const scaled = multiply(ka, 0.77) as Complex;
    endCorrectionPerRadius = divide(c(0.8216), add(c(1), divide(multiply(scaled, scaled), add(c(1), scaled)))) as Complex;
  }
  // R = -|R| exp(-2 j k l)
  const phase = multiply(multiply(ka, endCorrectionPerRadius), c(0, -2)) as Complex;
  return multiply(multiply(magnitude, exp(phase)), -1) as Complex;
}

function wavenumber(segment: Segment, frequencyHz: Complex, air: OracleAir, losses: OracleLosses): Complex {
  const free = multiply(frequencyHz, (2 * Math.PI) / air.speedMps) as Complex;
  const S = area(segment.section);
  const P = perimeter(segment.section);
  let k = free;
  if (losses.kirchhoff) {
    // Kirchhoff: alpha = (P/2S)(1/c) sqrt(omega nu / 2)[1 + 0.4/sqrt(0.71)], k = omega/c + alpha (1 - j)
    const nu = air.viscosityPaS / air.densityKgM3;
    const omega = multiply(frequencyHz, 2 * Math.PI) as Complex;
    const alpha = multiply(sqrt(multiply(omega, nu / 2) as Complex) as Complex, (P / (2 * S)) * (1 / air.speedMps) * (1 + 0.4 / Math.sqrt(0.71)));
    k = add(k, multiply(alpha, c(1, -1))) as Complex;
  }
  // Walls (flat measured figures) plus Sabine's 1.05 alpha^1.4 P/S dB/m for the lining, together at most
  // 40 dB over the segment (the flanking cap), as nepers: k - j alpha
  const liningDbPerM = segment.lining ? 1.05 * (segment.lining.absorption ?? 0) ** 1.4 * (P / S) : 0;
  const totalDbPerM = Math.min(losses.wallDbPerM + liningDbPerM, 40 / segment.lengthM);
  k = subtract(k, c(0, totalDbPerM / (20 / Math.LN10))) as Complex;
  return k;
}

/** What the oracle models of a run's losses: Kirchhoff's boundary layer and walls measured flat across the bands. */
export interface OracleLosses {
  kirchhoff: boolean;
  wallDbPerM: number;
}

export function oracleLosses(run: RunInput): OracleLosses {
  const kirchhoff = run.wallLosses ?? true;
  const walls = run.walls;
  if (!kirchhoff || walls?.kind === 'rigid') return { kirchhoff, wallDbPerM: 0 };
  if (walls?.kind !== 'measured' || walls.attenuationDbPerM.some((value) => value !== walls.attenuationDbPerM[0])) {
    throw new Error('the oracle models rigid walls and walls measured flat across the bands only');
  }
  return { kirchhoff, wallDbPerM: walls.attenuationDbPerM[0] };
}

/** Inverse plane-wave transfer matrix of a segment: [p, U] near = T [p, U] far. */
function inverseMatrix(segment: Segment, frequencyHz: Complex, air: OracleAir, losses: OracleLosses): Matrix {
  const kl = multiply(wavenumber(segment, frequencyHz, air, losses), segment.lengthM) as Complex;
  const zc = (air.densityKgM3 * air.speedMps) / area(segment.section);
  const cs = cos(kl);
  const sn = sin(kl);
  const entries: Complex[][] = [
    [cs, multiply(sn, c(0, zc)) as Complex],
    [multiply(sn, c(0, 1 / zc)) as Complex, cs],
  ];
  return matrix(entries);
}

/** Admittance U/p looking into a chain from its near end (U into the chain). */
export function chainAdmittance(segments: Segment[], end: Termination, frequencyHz: Complex, air: OracleAir, losses: OracleLosses): Complex {
  const last = segments[segments.length - 1];
  const zcLast = (air.densityKgM3 * air.speedMps) / area(last.section);
  const reflection = oracleReflection(end, frequencyHz, radius(last.section), air.speedMps);
  // Y = (1 - R) / (Zc (1 + R))
  let admittance = divide(subtract(c(1), reflection), multiply(add(c(1), reflection), zcLast)) as Complex;
  for (let index = segments.length - 1; index >= 0; index--) {
    for (const branch of segments[index].branches ?? []) {
      const branchAdmittance = chainAdmittance(branch.segments, branch.end, frequencyHz, air, losses);
      // Mouth mass in series: Y' = Y / (1 + j omega M Y), M = rho t_i / S_b
      const mass = (air.densityKgM3 * mouthCorrection(branch.segments[0].section, segments[index].section)) / area(branch.segments[0].section);
      const jOmegaMass = multiply(frequencyHz, c(0, 2 * Math.PI * mass)) as Complex;
      admittance = add(admittance, divide(branchAdmittance, add(c(1), multiply(jOmegaMass, branchAdmittance)))) as Complex;
    }
    const state = multiply(inverseMatrix(segments[index], frequencyHz, air, losses), matrix([[c(1)], [admittance]])) as Matrix;
    admittance = divide(state.get([1, 0]) as Complex, state.get([0, 0]) as Complex) as Complex;
  }
  return admittance;
}

/** 1 - Rs Gamma_in at the start end: zero at the natural frequencies (for a reflecting start). */
export function oracleMismatch(run: RunInput, frequencyHz: Complex): Complex {
  const air = oracleAir(run.temperatureC ?? 20);
  const losses = oracleLosses(run);
  const first = run.segments[0].section;
  const zc = (air.densityKgM3 * air.speedMps) / area(first);
  const admittance = chainAdmittance(run.segments, run.end, frequencyHz, air, losses);
  const gamma = divide(subtract(c(1), multiply(admittance, zc)), add(c(1), multiply(admittance, zc))) as Complex;
  const startReflection = oracleReflection(run.start, frequencyHz, radius(first), air.speedMps);
  return subtract(c(1), multiply(startReflection, gamma)) as Complex;
}

/** Complex root of the mismatch near a guess, by the secant method in the complex plane. */
export function oracleNaturalFrequency(run: RunInput, guessHz: number): Complex {
  let previous = c(guessHz * 0.999, 0);
  let current = c(guessHz, 0);
  let previousValue = oracleMismatch(run, previous);
  for (let iteration = 0; iteration < 60; iteration++) {
    const value = oracleMismatch(run, current);
    if (abs(value) === 0) break;
    const step = divide(multiply(value, subtract(current, previous)), subtract(value, previousValue)) as Complex;
    previous = current;
    previousValue = value;
    current = subtract(current, step) as Complex;
    if ((abs(step) as unknown as number) < 1e-10) break;
  }
  return current;
}

export { c as oracleComplex };
