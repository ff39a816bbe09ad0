// What the sweeps of antennas built from a library plan say: each antenna's measured offset
// from the model of its own wire, the mean per band, and the cut that starts from it.
import Link from "next/link";
import { tableClass } from "@/components/antenna-plan/table-class";
import { EmptyState } from "@/components/ui/notice";
import { formatCutLength, formatSigned, type Units } from "@/lib/plan-screen/format";
import { formatInZone } from "@/lib/time";
import type { PlanOffsets } from "@/server/services/sweeps";

const percent = (value: number) => `${formatSigned(value, 2)} %`;

export function PlanOffsetsCard({ offsets, planId, units, timeZone }: { offsets: PlanOffsets; planId: string; units: Units; timeZone: string }) {
  if (offsets.entries.length === 0) {
    return (
      <EmptyState title="Nothing measured yet">
        Sweeps uploaded for station slots built from this plan, or for the plan itself <Link href={`/bench?plan=${planId}`}>on the antenna bench</Link>, show here.
      </EmptyState>
    );
  }
  return (
    <div>
      <table className={`${tableClass} mb-4`} aria-label="Measured offsets">
        <caption>Each sweep&apos;s resonance against the model of the wire as built (negative: the real antenna resonates lower)</caption>
        <thead>
          <tr>
            <th scope="col">Antenna</th>
            <th scope="col">Measured</th>
            <th scope="col">Band</th>
            <th scope="col">Offset</th>
          </tr>
        </thead>
        <tbody>
          {offsets.entries.map((entry) => (
            <tr key={`${entry.sweepId}-${entry.band}`}>
              <th scope="row">
                {entry.slot ? (
                  <Link href={`/antenna-days/${entry.slot.dayId}/slots/${entry.slot.id}/plan?sweep=${entry.sweepId}`}>
                    {entry.slot.name}, {entry.slot.dayTitle}
                  </Link>
                ) : (
                  <Link href={`/bench?plan=${planId}&sweep=${entry.sweepId}`}>This plan, on the bench</Link>
                )}
              </th>
              <td>{formatInZone(entry.measuredAt, timeZone)}</td>
              <td>{entry.band}</td>
              <td className="whitespace-nowrap" data-figure="offset">
                {percent(entry.offsetPercent)}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      {offsets.nextCut && (
        <section aria-labelledby="next-cut">
          <h3 id="next-cut" className="mb-2 font-bold">
            Start the next cut from the measured offset
          </h3>
          <p className="mb-2 text-sm text-slate-700">
            {offsets.means.map((mean) => `${mean.band}: ${percent(mean.meanPercent)}, the mean of the latest sweep of ${mean.samples} antenna${mean.samples === 1 ? "" : "s"}`).join("; ")}. The
            length scales with 1/f, so each element is cut that much longer or shorter than the model says (common practice). Still cut the wrap allowance and
            measure before the final trim.
          </p>
          <table className={tableClass} aria-label="The next cut">
            <thead>
              <tr>
                <th scope="col">Piece</th>
                <th scope="col">Count</th>
                <th scope="col">The plan</th>
                <th scope="col">Start from</th>
                <th scope="col">Difference</th>
              </tr>
            </thead>
            <tbody>
              {offsets.nextCut.pieces.map((piece) => (
                <tr key={piece.label}>
                  <th scope="row">{piece.label}</th>
                  <td>{piece.count}</td>
                  <td>{formatCutLength(piece.lengthM, units)}</td>
                  <td className="font-bold" data-figure="next-cut">
                    {formatCutLength(piece.newLengthM, units)}
                  </td>
                  <td>
                    {Math.abs(piece.changeM) < 0.0005 ? "—" : `${piece.changeM < 0 ? "−" : "+"}${formatCutLength(Math.abs(piece.changeM), units)}`}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      )}
    </div>
  );
}
