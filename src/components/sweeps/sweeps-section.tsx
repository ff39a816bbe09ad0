// A station slot's (or a library plan's) measured sweeps: the history with dates and who
// measured, the chosen sweep against the plan with the trim advice, and the upload form for
// those who may upload. The plan screen below draws the chosen sweep over its charts.
import Link from "next/link";
import { tableClass } from "@/components/antenna-plan/table-class";
import { DeleteButton } from "@/components/ui/delete-button";
import { Card, EmptyState } from "@/components/ui/notice";
import { formatMHz, type Units } from "@/lib/plan-screen/format";
import { PLACE_LABELS } from "@/lib/sweeps/feed-point";
import { QUANTITY_LABELS } from "@/lib/sweeps/parse";
import { formatInZone } from "@/lib/time";
import type { SweepAccess, SweepDetailDto, SweepSummaryDto } from "@/server/services/sweeps";
import { sweepHref } from "./sweep-href";
import { SweepAnalysis, shiftText } from "./sweep-analysis";
import { SweepUploadForm, type SweepUploadFormProps } from "./sweep-upload-form";

interface SweepsSectionProps {
  sweeps: SweepSummaryDto[];
  selected: SweepDetailDto | null;
  /** The plan changed since the selected sweep was compared with it. */
  planChanged: boolean;
  access: SweepAccess;
  upload: SweepUploadFormProps;
  timeZone: string;
  units: Units;
}

export function SweepsSection({ sweeps, selected, planChanged, access, upload, timeZone, units }: SweepsSectionProps) {
  const when = (sweep: SweepSummaryDto) => formatInZone(sweep.measuredAt, timeZone);
  return (
    <>
      <Card title="Measured sweeps">
        <p className="mb-3 max-w-3xl text-slate-700">
          What an analyser measured on this antenna, newest first. The chosen sweep is compared with the plan below, and the plan&apos;s charts draw it over the
          prediction with dotted lines.
        </p>
        {sweeps.length === 0 ? (
          <EmptyState title="No sweeps yet">Upload the analyser&apos;s export after sweeping the band, before and after each trim.</EmptyState>
        ) : (
          <div className="overflow-x-auto">
            <table className={tableClass} aria-label="Sweeps of this antenna">
              <thead>
                <tr>
                  <th scope="col">Measured</th>
                  <th scope="col">By</th>
                  <th scope="col">Where and what</th>
                  <th scope="col">Analyser</th>
                  <th scope="col">Resonance and shift</th>
                  <th scope="col">File</th>
                  <th scope="col">
                    <span className="sr-only">Actions</span>
                  </th>
                </tr>
              </thead>
              <tbody>
                {sweeps.map((sweep) => (
                  <tr key={sweep.id} aria-current={selected?.id === sweep.id ? "true" : undefined} className={selected?.id === sweep.id ? "bg-copper-50" : ""}>
                    <th scope="row">
                      {when(sweep)}
                      {sweep.note && <span className="block text-sm font-normal text-slate-700">{sweep.note}</span>}
                    </th>
                    <td>{sweep.uploadedBy?.name ?? "a former member"}</td>
                    <td>
                      {QUANTITY_LABELS[sweep.quantity]}, {PLACE_LABELS[sweep.place]}
                    </td>
                    <td>{sweep.analyser ? `${sweep.analyser.labelCode}: ${sweep.analyser.name}` : "the member's own"}</td>
                    <td>
                      {sweep.bands.map((band) => (
                        <span key={band.band} className="block">
                          {band.band}: {band.measuredMHz === null ? "not found" : formatMHz(band.measuredMHz)}, {shiftText(band)}
                        </span>
                      ))}
                    </td>
                    <td>
                      <a href={sweep.fileUrl} download>
                        {sweep.fileName}
                      </a>
                    </td>
                    <td className="whitespace-nowrap">
                      {selected?.id === sweep.id ? (
                        <span className="px-2 text-sm font-bold text-copper-800">Shown</span>
                      ) : (
                        <Link href={sweepHref(upload.pagePath, sweep.id)} className="inline-flex min-h-11 items-center px-2 text-sm font-bold">
                          Show <span className="sr-only">&nbsp;the sweep of {when(sweep)}</span>
                        </Link>
                      )}
                      {sweep.canDelete && (
                        <DeleteButton url={`/api/sweeps/${sweep.id}`} verb="Delete" what={`the sweep of ${when(sweep)}`} confirm={`Delete the sweep of ${when(sweep)} and its file?`} then={upload.pagePath} />
                      )}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </Card>
      {selected && (
        <Card title={`The sweep of ${when(selected)} against the plan`}>
          <SweepAnalysis sweep={selected} units={units} planChanged={planChanged} />
        </Card>
      )}
      <Card>
        <details open={sweeps.length === 0}>
          <summary className="min-h-11 cursor-pointer py-2 text-lg font-bold text-copper-700">Upload a sweep</summary>
          {access.canUpload ? <SweepUploadForm {...upload} /> : <p className="text-slate-700">{access.reason}</p>}
        </details>
      </Card>
    </>
  );
}
