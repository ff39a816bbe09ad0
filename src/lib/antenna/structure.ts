/**
 * Wire structures: the types the engine takes, the geometry rules a thin-wire
 * model needs, and the automatic segmentation.
 *
 * Wires whose ends lie within 1 mm of each other are joined (bends, T-junctions,
 * radial hubs). Over a perfect ground, a wire end within 1 mm of z = 0 is
 * connected to the ground plane. The feed point always becomes a segment
 * boundary: a wire carrying the feed at 0 < at < 1 is cut there into two parts,
 * each segmented on its own.
 */
import { MAX_MHZ, MAX_SEGMENTS, structureSchema } from "./evaluate-schema";
import { wavelengthMetres, ALUMINIUM_CONDUCTIVITY, COPPER_CONDUCTIVITY } from "./physics";
import { EngineInputError, parseOrThrow } from "./problems";

export type Vec3 = [number, number, number];
export type Conductor = "perfect" | "copper" | "aluminium";
export interface Wire {
  from: Vec3;
  to: Vec3;
  diameterMm: number;
  segments?: number;
  conductor?: Conductor;
}
export type Ground =
  | { kind: "free" }
  | { kind: "perfect" }
  | { kind: "real"; conductivitySm: number; relativePermittivity: number };
/** The source: at fraction `at` of wire `wire`'s length, measured from its `from` end. */
export interface Feed {
  wire: number;
  at: number;
}
export interface Structure {
  wires: Wire[];
  feed: Feed;
  ground: Ground;
}

/** Wire ends closer than this are joined electrically (engine-contract.md). */
export const JOIN_TOLERANCE_M = 1e-3;
/** Automatic segmentation: segments per wavelength at the highest frequency. */
export const SEGMENTS_PER_WAVELENGTH = 40;
/** Thin-wire limit: every segment at least this many wire radii long. */
export const MIN_SEGMENT_RADII = 3;
/** A segment may be at most a quarter wavelength long (the sinusoidal basis needs sin(kΔ) well away from 0). */
export const MAX_SEGMENT_WAVELENGTHS = 0.25;
/** Thin-wire limit on thickness: k·a at the highest frequency at most this. */
export const MAX_KA = 0.1;

/** The segmented structure, in flat arrays (three numbers per point). */
export interface SegmentedStructure {
  count: number;
  /** Index of the wire each segment belongs to. */
  wire: Int32Array;
  start: Float64Array;
  end: Float64Array;
  radius: Float64Array;
  /** Conductivity in S/m; Infinity for a perfect conductor. */
  conductivity: Float64Array;
  startNode: Int32Array;
  endNode: Int32Array;
  nodeCount: number;
  /** 1 where the node is connected to a perfect ground plane. */
  groundNode: Uint8Array;
  /** The source sits at end `feedEnd` (0 = start, 1 = end) of segment `feedSegment`. */
  feedSegment: number;
  feedEnd: 0 | 1;
  ground: Ground;
}

type Point = readonly [number, number, number];

function distance(a: Point, b: Point): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);
}

function lerp(a: Point, b: Point, t: number): Vec3 {
  return [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t, a[2] + (b[2] - a[2]) * t];
}

/** Shortest distance between segments p0–p1 and q0–q1. */
export function segmentDistance(p0: Point, p1: Point, q0: Point, q1: Point): number {
  const d1 = [p1[0] - p0[0], p1[1] - p0[1], p1[2] - p0[2]];
  const d2 = [q1[0] - q0[0], q1[1] - q0[1], q1[2] - q0[2]];
  const r = [p0[0] - q0[0], p0[1] - q0[1], p0[2] - q0[2]];
  const a = d1[0] * d1[0] + d1[1] * d1[1] + d1[2] * d1[2];
  const e = d2[0] * d2[0] + d2[1] * d2[1] + d2[2] * d2[2];
  const f = d2[0] * r[0] + d2[1] * r[1] + d2[2] * r[2];
  const c = d1[0] * r[0] + d1[1] * r[1] + d1[2] * r[2];
  const b = d1[0] * d2[0] + d1[1] * d2[1] + d1[2] * d2[2];
  const denom = a * e - b * b;
  let s = denom > 1e-14 * a * e ? clamp01((b * f - c * e) / denom) : 0;
  let t = (b * s + f) / e;
  if (t < 0) {
    t = 0;
    s = clamp01(-c / a);
  } else if (t > 1) {
    t = 1;
    s = clamp01((b - c) / a);
  }
  return distance(lerp(p0, p1, s), lerp(q0, q1, t));
}

function clamp01(x: number): number {
  return x < 0 ? 0 : x > 1 ? 1 : x;
}

function conductivityOf(conductor: Conductor | undefined): number {
  if (conductor === "copper") return COPPER_CONDUCTIVITY;
  if (conductor === "aluminium") return ALUMINIUM_CONDUCTIVITY;
  return Infinity;
}

function metres(x: number): string {
  return `${Number(x.toPrecision(4))} m`;
}

/** Join wire ends within JOIN_TOLERANCE_M; returns the node index of every end (2 per wire) and node positions. */
function joinEnds(wires: Wire[]): { endNode: Int32Array; nodes: Vec3[] } {
  const ends: Point[] = wires.flatMap((w) => [w.from, w.to]);
  const parent = Int32Array.from(ends.keys());
  const root = (i: number): number => {
    while (parent[i] !== i) i = parent[i] = parent[parent[i]];
    return i;
  };
  for (let i = 0; i < ends.length; i++) {
    for (let j = i + 1; j < ends.length; j++) {
      if (distance(ends[i], ends[j]) <= JOIN_TOLERANCE_M) parent[root(j)] = root(i);
    }
  }
  const nodeOfRoot = new Map<number, number>();
  const sums: Vec3[] = [];
  const counts: number[] = [];
  const endNode = new Int32Array(ends.length);
  ends.forEach((p, i) => {
    const r = root(i);
    let node = nodeOfRoot.get(r);
    if (node === undefined) {
      node = sums.length;
      nodeOfRoot.set(r, node);
      sums.push([0, 0, 0]);
      counts.push(0);
    }
    endNode[i] = node;
    for (let c = 0; c < 3; c++) sums[node][c] += p[c];
    counts[node] += 1;
  });
  const nodes = sums.map((s, n): Vec3 => [s[0] / counts[n], s[1] / counts[n], s[2] / counts[n]]);
  return { endNode, nodes };
}

interface WirePart {
  wire: number;
  from: Vec3;
  to: Vec3;
  fromNode: number;
  toNode: number;
  segments: number;
}

/**
 * Check the geometry and cut every wire into segments for solving up to maxMHz.
 * Throws EngineInputError listing every problem as `path: message`.
 */
export function segmentStructure(input: Structure, maxMHz: number): SegmentedStructure {
  const structure = parseOrThrow(structureSchema, input);
  if (!(maxMHz > 0 && maxMHz <= MAX_MHZ)) {
    throw new EngineInputError([`frequenciesMHz: must be greater than 0 and at most ${MAX_MHZ} MHz`]);
  }
  const { wires, feed, ground } = structure;
  const lambda = wavelengthMetres(maxMHz);
  const problems: string[] = [];

  wires.forEach((w, i) => {
    const radius = w.diameterMm / 2000;
    if (distance(w.from, w.to) <= JOIN_TOLERANCE_M) {
      problems.push(`wires[${i}].to: must differ from \`from\` (the wire has zero length)`);
    }
    if ((2 * Math.PI * radius) / lambda > MAX_KA) {
      const limit = (MAX_KA * lambda * 1000) / Math.PI;
      problems.push(
        `wires[${i}].diameterMm: too thick for a thin-wire model at ${maxMHz} MHz (at most ${Number(limit.toPrecision(3))} mm)`,
      );
    }
    for (const endName of ["from", "to"] as const) {
      const z = w[endName][2];
      if (ground.kind === "real" && z <= 0) {
        problems.push(`wires[${i}].${endName}: z = ${z} m is not above the ground; with real ground every wire must stay above z = 0`);
      }
      if (ground.kind === "perfect" && z < -JOIN_TOLERANCE_M) {
        problems.push(`wires[${i}].${endName}: z = ${z} m is below the ground plane at z = 0`);
      }
    }
    if (ground.kind === "perfect" && Math.abs(w.from[2]) <= JOIN_TOLERANCE_M && Math.abs(w.to[2]) <= JOIN_TOLERANCE_M) {
      problems.push(`wires[${i}]: lies on the ground plane (both ends at z = 0), where a perfect ground shorts it out`);
    }
  });
  if (problems.length > 0) throw new EngineInputError(problems);

  const { endNode, nodes } = joinEnds(wires);
  const onGround = (node: number) => ground.kind === "perfect" && Math.abs(nodes[node][2]) <= JOIN_TOLERANCE_M;
  for (let n = 0; n < nodes.length; n++) if (onGround(n)) nodes[n][2] = 0;

  // Wires that are not joined must not touch or cross.
  for (let i = 0; i < wires.length; i++) {
    for (let j = i + 1; j < wires.length; j++) {
      const shared = [endNode[2 * i], endNode[2 * i + 1]].some((n) => n === endNode[2 * j] || n === endNode[2 * j + 1]);
      if (shared) continue;
      const gap = segmentDistance(wires[i].from, wires[i].to, wires[j].from, wires[j].to);
      if (gap <= (wires[i].diameterMm + wires[j].diameterMm) / 2000) {
        problems.push(`wires[${j}]: touches or crosses wires[${i}] away from their ends; wires may only be joined end to end`);
      }
    }
  }

  // Feed placement: a node at fraction `at` of the feed wire.
  const feedAtEnd = feed.at === 0 || feed.at === 1;
  if (feedAtEnd) {
    const node = endNode[2 * feed.wire + (feed.at === 0 ? 0 : 1)];
    const endsAtNode = endNode.filter((n) => n === node).length;
    if (endsAtNode < 2 && !onGround(node)) {
      problems.push(`feed.at: the feed is at an open end of wires[${feed.wire}], where no current can flow`);
    }
  }
  if (problems.length > 0) throw new EngineInputError(problems);

  const maxLength = MAX_SEGMENT_WAVELENGTHS * lambda * (1 + 1e-9);
  const parts: WirePart[] = [];
  let nextNode = nodes.length;
  let feedNode = feedAtEnd ? endNode[2 * feed.wire + (feed.at === 0 ? 0 : 1)] : -1;
  wires.forEach((w, i) => {
    const from = nodes[endNode[2 * i]];
    const to = nodes[endNode[2 * i + 1]];
    const length = distance(from, to);
    const radius = w.diameterMm / 2000;
    const minLength = MIN_SEGMENT_RADII * radius;
    const split = i === feed.wire && !feedAtEnd;
    const fractions = split ? [feed.at, 1 - feed.at] : [1];
    let counts: number[];
    if (w.segments === undefined) {
      counts = fractions.map((f) => {
        const partLength = f * length;
        const wanted = Math.max(1, Math.ceil((partLength * SEGMENTS_PER_WAVELENGTH) / lambda));
        return Math.max(1, Math.min(wanted, Math.floor(partLength / minLength)));
      });
    } else if (split) {
      const exact = feed.at * w.segments;
      const first = Math.abs(exact - Math.round(exact)) < 1e-6 ? Math.round(exact) : Math.floor(exact);
      const clamped = Math.min(Math.max(first, 1), Math.max(w.segments - 1, 1));
      counts = [clamped, Math.max(w.segments - clamped, 1)];
    } else {
      counts = [w.segments];
    }
    fractions.forEach((f, k) => {
      const segLength = (f * length) / counts[k];
      const where = split ? ` (the ${k === 0 ? "part before" : "part after"} the feed point)` : "";
      if (segLength < minLength * (1 - 1e-9)) {
        const field = w.segments === undefined || (split && counts[k] === 1) ? (split ? "feed.at" : `wires[${i}]`) : `wires[${i}].segments`;
        problems.push(
          `${field}: segments of wires[${i}]${where} would be ${metres(segLength)} long, shorter than ${MIN_SEGMENT_RADII} wire radii (${metres(minLength)}); use fewer segments, a thinner wire or a longer wire`,
        );
      }
      if (segLength > maxLength) {
        problems.push(
          `wires[${i}].segments: segments of ${metres(segLength)}${where} are longer than a quarter wavelength at ${maxMHz} MHz (${metres(lambda / 4)}); use more segments`,
        );
      }
    });
    if (split) {
      const mid = lerp(from, to, feed.at);
      const midNode = nextNode++;
      nodes.push(mid);
      feedNode = midNode;
      parts.push({ wire: i, from, to: mid, fromNode: endNode[2 * i], toNode: midNode, segments: counts[0] });
      parts.push({ wire: i, from: mid, to, fromNode: midNode, toNode: endNode[2 * i + 1], segments: counts[1] });
    } else {
      parts.push({ wire: i, from, to, fromNode: endNode[2 * i], toNode: endNode[2 * i + 1], segments: counts[0] });
    }
  });
  const total = parts.reduce((sum, p) => sum + p.segments, 0);
  if (total > MAX_SEGMENTS) {
    problems.push(`wires: ${total} segments in all, more than the ${MAX_SEGMENTS} allowed; use fewer or shorter wires or a lower frequency`);
  }
  if (problems.length > 0) throw new EngineInputError(problems);

  const seg: SegmentedStructure = {
    count: total,
    wire: new Int32Array(total),
    start: new Float64Array(3 * total),
    end: new Float64Array(3 * total),
    radius: new Float64Array(total),
    conductivity: new Float64Array(total),
    startNode: new Int32Array(total),
    endNode: new Int32Array(total),
    nodeCount: 0,
    groundNode: new Uint8Array(0),
    feedSegment: -1,
    feedEnd: 0,
    ground,
  };
  let s = 0;
  for (const part of parts) {
    const w = wires[part.wire];
    for (let k = 0; k < part.segments; k++, s++) {
      const a = lerp(part.from, part.to, k / part.segments);
      const b = k === part.segments - 1 ? part.to : lerp(part.from, part.to, (k + 1) / part.segments);
      seg.start.set(a, 3 * s);
      seg.end.set(b, 3 * s);
      seg.wire[s] = part.wire;
      seg.radius[s] = w.diameterMm / 2000;
      seg.conductivity[s] = conductivityOf(w.conductor);
      seg.startNode[s] = k === 0 ? part.fromNode : nextNode;
      if (k > 0) seg.endNode[s - 1] = nextNode++;
      if (k === part.segments - 1) seg.endNode[s] = part.toNode;
    }
  }
  seg.nodeCount = nextNode;
  seg.groundNode = new Uint8Array(nextNode);
  for (let n = 0; n < nodes.length; n++) if (onGround(n)) seg.groundNode[n] = 1;

  // The source: the node at `at` on the feed wire, seen from the first segment touching it.
  for (let i = 0; i < total && seg.feedSegment < 0; i++) {
    if (seg.wire[i] !== feed.wire) continue;
    if (seg.endNode[i] === feedNode) {
      seg.feedSegment = i;
      seg.feedEnd = 1;
    } else if (seg.startNode[i] === feedNode) {
      seg.feedSegment = i;
      seg.feedEnd = 0;
    }
  }

  checkOverlapsAtJoins(seg, problems);
  if (problems.length > 0) throw new EngineInputError(problems);
  return seg;
}

function point(array: Float64Array, i: number): Vec3 {
  return [array[3 * i], array[3 * i + 1], array[3 * i + 2]];
}

/** Joined wires must leave their common node at angles wide enough that their first segments do not overlap. */
function checkOverlapsAtJoins(seg: SegmentedStructure, problems: string[]): void {
  const atNode = new Map<number, number[]>();
  for (let i = 0; i < seg.count; i++) {
    for (const node of [seg.startNode[i], seg.endNode[i]]) {
      const list = atNode.get(node) ?? [];
      list.push(i);
      atNode.set(node, list);
    }
  }
  const reported = new Set<string>();
  for (const list of atNode.values()) {
    for (let x = 0; x < list.length; x++) {
      for (let y = x + 1; y < list.length; y++) {
        const [p, q] = [list[x], list[y]];
        const lengthP = distance(point(seg.start, p), point(seg.end, p));
        const lengthQ = distance(point(seg.start, q), point(seg.end, q));
        const [short, long] = lengthP <= lengthQ ? [p, q] : [q, p];
        const mid = lerp(point(seg.start, short), point(seg.end, short), 0.5);
        const gap = segmentDistance(mid, mid, point(seg.start, long), point(seg.end, long));
        const key = `${seg.wire[p]}-${seg.wire[q]}`;
        if (gap <= seg.radius[p] + seg.radius[q] && !reported.has(key)) {
          reported.add(key);
          problems.push(
            `wires[${seg.wire[q]}]: overlaps wires[${seg.wire[p]}] where they meet; joined wires must leave their common end at a wider angle`,
          );
        }
      }
    }
  }
}
