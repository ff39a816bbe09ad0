/** The sweep points at a band's edges (the engine puts both edges on its sweep grid). */
import type { PlanBand, SweepPoint } from "@/lib/antenna/plan";

function nearest(sweep: SweepPoint[], mhz: number): SweepPoint {
  return sweep.reduce((best, point) => (Math.abs(point.mhz - mhz) < Math.abs(best.mhz - mhz) ? point : best));
}

export function bandEdgePoints(band: PlanBand): { low: SweepPoint; high: SweepPoint } {
  return { low: nearest(band.sweep, band.band.lowMHz), high: nearest(band.sweep, band.band.highMHz) };
}
