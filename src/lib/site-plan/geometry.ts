/**
 * Plane geometry of a site plan. Coordinates are metres on the ground: x east, y north,
 * the origin at the site's south-west corner. Everything here is the horizontal projection.
 */

export type Point = readonly [x: number, y: number];

export interface Segment {
  from: Point;
  to: Point;
}

export function distance(a: Point, b: Point): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1]);
}

/** The point `lengthM` from `origin` along a compass bearing (0° north, 90° east). */
export function pointAtBearing(origin: Point, bearingDeg: number, lengthM: number): Point {
  const radians = (bearingDeg * Math.PI) / 180;
  return [origin[0] + lengthM * Math.sin(radians), origin[1] + lengthM * Math.cos(radians)];
}

export function pointToSegmentDistance(point: Point, segment: Segment): number {
  const [ax, ay] = segment.from;
  const dx = segment.to[0] - ax;
  const dy = segment.to[1] - ay;
  const lengthSquared = dx * dx + dy * dy;
  const t = lengthSquared === 0 ? 0 : Math.max(0, Math.min(1, ((point[0] - ax) * dx + (point[1] - ay) * dy) / lengthSquared));
  return distance(point, [ax + t * dx, ay + t * dy]);
}

/** Signed area test: which side of a→b the point c lies on. */
function orientation(a: Point, b: Point, c: Point): number {
  return Math.sign((b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]));
}

function onSegment(a: Point, b: Point, c: Point): boolean {
  return Math.min(a[0], b[0]) <= c[0] && c[0] <= Math.max(a[0], b[0]) && Math.min(a[1], b[1]) <= c[1] && c[1] <= Math.max(a[1], b[1]);
}

export function segmentsIntersect(s: Segment, t: Segment): boolean {
  const o1 = orientation(s.from, s.to, t.from);
  const o2 = orientation(s.from, s.to, t.to);
  const o3 = orientation(t.from, t.to, s.from);
  const o4 = orientation(t.from, t.to, s.to);
  if (o1 !== o2 && o3 !== o4) return true;
  return (
    (o1 === 0 && onSegment(s.from, s.to, t.from)) ||
    (o2 === 0 && onSegment(s.from, s.to, t.to)) ||
    (o3 === 0 && onSegment(t.from, t.to, s.from)) ||
    (o4 === 0 && onSegment(t.from, t.to, s.to))
  );
}

export function segmentToSegmentDistance(s: Segment, t: Segment): number {
  if (segmentsIntersect(s, t)) return 0;
  return Math.min(
    pointToSegmentDistance(s.from, t),
    pointToSegmentDistance(s.to, t),
    pointToSegmentDistance(t.from, s),
    pointToSegmentDistance(t.to, s),
  );
}

/** The segments of a polyline, or of a polygon when `closed`. A single point is a zero-length segment. */
export function segmentsOf(points: readonly Point[], closed: boolean): Segment[] {
  if (points.length === 1) return [{ from: points[0], to: points[0] }];
  const segments: Segment[] = [];
  for (let i = 0; i + 1 < points.length; i++) segments.push({ from: points[i], to: points[i + 1] });
  if (closed && points.length > 2) segments.push({ from: points[points.length - 1], to: points[0] });
  return segments;
}

/** Even-odd rule; a point on the edge counts as inside. */
export function pointInPolygon(point: Point, polygon: readonly Point[]): boolean {
  if (polygon.length < 3) return false;
  if (segmentsOf(polygon, true).some((edge) => pointToSegmentDistance(point, edge) === 0)) return true;
  let inside = false;
  for (let i = 0, j = polygon.length - 1; i < polygon.length; j = i++) {
    const [xi, yi] = polygon[i];
    const [xj, yj] = polygon[j];
    if (yi > point[1] !== yj > point[1] && point[0] < ((xj - xi) * (point[1] - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

/** A shape on the plan: a polyline, or a polygon (closed, with its inside) when `closed`. */
export interface Shape {
  points: readonly Point[];
  closed: boolean;
}

/** The shortest distance between two shapes; 0 when they touch, cross, or one lies inside a polygon. */
export function shapeDistance(a: Shape, b: Shape): number {
  if (a.closed && b.points.some((point) => pointInPolygon(point, a.points))) return 0;
  if (b.closed && a.points.some((point) => pointInPolygon(point, b.points))) return 0;
  let best = Infinity;
  for (const s of segmentsOf(a.points, a.closed)) {
    for (const t of segmentsOf(b.points, b.closed)) best = Math.min(best, segmentToSegmentDistance(s, t));
  }
  return best;
}

export function pointToShapeDistance(point: Point, shape: Shape): number {
  return shapeDistance({ points: [point], closed: false }, shape);
}
