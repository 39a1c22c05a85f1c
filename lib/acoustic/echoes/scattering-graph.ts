// The run as a graph for the echo lattice: edges are uniform stretches of duct, nodes are the start,
// ends, area changes and tees. Each node scatters with real, low-frequency coefficients (so a tee is
// a plain junction of areas: its branch mouth's mass, tee-junction.ts, only acts as frequency rises).
import { airProperties } from '../air';
import { DEFAULT_TEMPERATURE_C } from '../constants';
import { equivalentRadiusM, sectionArea } from '../section';
import { lowFrequencyEndCorrectionM, terminationReflection } from '../terminations';
import type { RunInput, Segment, Termination, Wall } from '../types';
import { segmentAttenuation } from '../walls/segment-attenuation';

/**
 * The echo lattice is broadband; its arrivals are attenuated by the walls and lining as in this
 * octave band (250 Hz: the middle of the range where the plane waves that carry the echoes dominate;
 * product rule).
 */
const ECHO_BAND_INDEX = 2;

export interface GraphEdge {
  lengthM: number;
  areaM2: number;
  /** Amplitude factor of one traversal (walls and lining in the 250 Hz band). */
  transmission: number;
  nodes: [number, number];
}

export interface GraphNode {
  label: string;
  edges: number[];
  /** A termination at the node, as the area of duct with the same admittance: S (1 - R)/(1 + R); Infinity for R = -1. */
  terminationArea: number;
  /** Extra round-trip delay of a reflection here (an open end reflects 2 delta / c late). */
  reflectionDelayS: number;
}

export interface ScatteringGraph {
  nodes: GraphNode[];
  edges: GraphEdge[];
  speedOfSoundMps: number;
}

const AREA_MATCH = 1e-12;

interface WallsOfRun {
  walls: Wall | undefined;
  wallLosses: boolean;
}

function addNode(graph: ScatteringGraph, label: string): number {
  graph.nodes.push({ label, edges: [], terminationArea: 0, reflectionDelayS: 0 });
  return graph.nodes.length - 1;
}

function attachTermination(graph: ScatteringGraph, node: number, termination: Termination, segment: Segment): void {
  const areaM2 = sectionArea(segment.section);
  const radiusM = equivalentRadiusM(segment.section);
  // Low-frequency limit of the termination's reflection coefficient (real).
  const reflection = terminationReflection(termination, { re: 0, im: 0 }, radiusM, graph.speedOfSoundMps).re;
  graph.nodes[node].terminationArea = reflection === -1 ? Infinity : (areaM2 * (1 - reflection)) / (1 + reflection);
  graph.nodes[node].reflectionDelayS = (2 * lowFrequencyEndCorrectionM(termination, radiusM)) / graph.speedOfSoundMps;
}

function linkEdge(graph: ScatteringGraph, from: number, to: number, lengthM: number, areaM2: number, attenuationNp: number): void {
  graph.edges.push({ lengthM, areaM2, transmission: Math.exp(-attenuationNp), nodes: [from, to] });
  graph.nodes[from].edges.push(graph.edges.length - 1);
  graph.nodes[to].edges.push(graph.edges.length - 1);
}

/** Adds a chain of segments from node `from`; consecutive segments of equal area without tees merge into one edge. */
function addChain(graph: ScatteringGraph, from: number, segments: Segment[], end: Termination, prefix: string, walls: WallsOfRun): void {
  let startNode = from;
  let runLengthM = 0;
  let runAttenuationNp = 0;
  let positionM = 0;
  segments.forEach((segment, index) => {
    const areaM2 = sectionArea(segment.section);
    runLengthM += segment.lengthM;
    positionM += segment.lengthM;
    runAttenuationNp += segmentAttenuation(segment, walls.walls, walls.wallLosses).npPerM[ECHO_BAND_INDEX] * segment.lengthM;
    const isLast = index === segments.length - 1;
    const branches = segment.branches ?? [];
    const nextArea = isLast ? areaM2 : sectionArea(segments[index + 1].section);
    if (!isLast && branches.length === 0 && Math.abs(nextArea - areaM2) <= AREA_MATCH * areaM2) return;
    const where = `@${positionM.toFixed(2)} m`;
    const label = isLast ? `${prefix}end` : `${prefix}${branches.length > 0 ? 'tee' : 'area-change'}${where}`;
    const node = addNode(graph, label);
    linkEdge(graph, startNode, node, runLengthM, areaM2, runAttenuationNp);
    if (isLast) attachTermination(graph, node, end, segment);
    branches.forEach((branch) => addChain(graph, node, branch.segments, branch.end, `${prefix}branch${where}: `, walls));
    startNode = node;
    runLengthM = 0;
    runAttenuationNp = 0;
  });
}

export function buildScatteringGraph(input: RunInput): ScatteringGraph {
  const air = airProperties(input.temperatureC ?? DEFAULT_TEMPERATURE_C);
  const graph: ScatteringGraph = { nodes: [], edges: [], speedOfSoundMps: air.speedOfSoundMps };
  const start = addNode(graph, 'start');
  attachTermination(graph, start, input.start, input.segments[0]);
  addChain(graph, start, input.segments, input.end, '', { walls: input.walls, wallLosses: input.wallLosses ?? true });
  return graph;
}

