/**
 * The hazards a coordinator marks on a site. Coordinates in metres, x east, y north.
 * Paths are polylines, public areas polygons; both are where the public may be.
 */
import type { Point, Shape } from "./geometry";

export const HAZARD_KINDS = ["power-line", "path", "public-area", "tree", "building"] as const;
export type HazardKind = (typeof HAZARD_KINDS)[number];

export type Hazard =
  | { kind: "power-line"; label: string; points: Point[]; heightM: number }
  | { kind: "path"; label: string; points: Point[] }
  | { kind: "public-area"; label: string; points: Point[] }
  | { kind: "tree"; label: string; points: [Point]; heightM: number }
  | { kind: "building"; label: string; points: Point[]; heightM: number };

export const hazardKindLabels: Record<HazardKind, string> = {
  "power-line": "Overhead power line",
  path: "Path",
  "public-area": "Public area",
  tree: "Tree",
  building: "Building",
};

/** How many points each kind needs: a line needs two, an area three, a tree one. */
export const hazardPointCounts: Record<HazardKind, { min: number; max: number }> = {
  "power-line": { min: 2, max: 50 },
  path: { min: 2, max: 50 },
  "public-area": { min: 3, max: 50 },
  tree: { min: 1, max: 1 },
  building: { min: 3, max: 50 },
};

export const hazardHasHeight = (kind: HazardKind): boolean => kind === "power-line" || kind === "tree" || kind === "building";

/** Where the public may be: paths and public areas. */
export const isPublicHazard = (hazard: Hazard): boolean => hazard.kind === "path" || hazard.kind === "public-area";

export function hazardShape(hazard: Hazard): Shape {
  return { points: hazard.points, closed: hazard.kind === "public-area" || hazard.kind === "building" };
}
