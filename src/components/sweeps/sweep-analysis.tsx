// A measured sweep against the plan: per band the measured and predicted resonance, the shift,
// the 2:1 bandwidth at the radio and the band fit; how the other end of the feedline was worked
// out; and how much to cut or add on each piece, by the rule of thumb and by the engine. No
// hooks, so it renders on the server. Figures carry data-figure names for tests and readers.
import { tableClass } from "@/components/antenna-plan/table-class";
import { Notice } from "@/components/ui/notice";
import type { PieceChange } from "@/lib/antenna/trim";
import { CLOSING_CAUTION, TRIM_CAUTIONS } from "@/lib/plan-screen/cautions";
import { formatBandwidth, formatCutLength, formatMHz, formatSigned, type Units } from "@/lib/plan-screen/format";
import { ON_TARGET_PERCENT, type BandComparison } from "@/lib/sweeps/analysis";
import type { SweepDetailDto } from "@/server/services/sweeps";
import { Figure } from "@/components/ui/figure";

export function shiftText(band: { shiftKHz: number | null; shiftPercent: number | null }): string {
  if (band.shiftKHz === null || band.shiftPercent === null) return "not found";
  return `${formatSigned(band.shiftKHz, 0)} kHz (${formatSigned(band.shiftPercent, 2)} %)`;
}

export const verdictText: Record<BandComparison["verdict"], string> = {
  low: "Resonates low: the wire is long",
  high: "Resonates high: the wire is short",
  "on-target": `On target (within ${ON_TARGET_PERCENT} %)`,
  "not-found": "No resonance found in the sweep",
};

const fitText: Record<BandComparison["bandFits"], string> = {
  yes: "Yes: the whole band is under 2:1 at the radio",
  no: "No: part of the band is above 2:1 at the radio",
  "not-covered": "Not known: the sweep does not cover the whole band",
  unknown: "Not known: the SWR at the radio cannot be worked out from this sweep",
};

function BandFigures({ band }: { band: BandComparison }) {
  const method = band.method === "reactance-zero" ? "X crosses zero" : "SWR dip";
  return (
    <section aria-label={`Measured against the plan, ${band.band}`} className="mb-4">
      <h4 className="mb-2 font-bold">
        {band.band} ({formatMHz(band.lowMHz)} – {formatMHz(band.highMHz)})
      </h4>
      <dl className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
        <Figure name="measured-resonance" label={`Measured resonance (${method})`}>
          {band.measuredMHz === null ? "not in the sweep" : formatMHz(band.measuredMHz)}
        </Figure>
        <Figure name="predicted-resonance" label={`Predicted resonance (${method})`}>
          {band.predictedMHz === null ? "not predicted" : formatMHz(band.predictedMHz)}
        </Figure>
        <Figure name="resonance-shift" label="Shift from the prediction">
          {shiftText(band)}
        </Figure>
        <Figure name="verdict" label="Verdict">
          {verdictText[band.verdict]}
        </Figure>
        <Figure name="measured-bandwidth" label="Measured 2:1 bandwidth at the radio">
          {formatBandwidth(band.bandwidth)}
        </Figure>
        <Figure name="band-fits" label="Band fits under 2:1">
          {fitText[band.bandFits]}
        </Figure>
      </dl>
      {band.notes.length > 0 && (
        <ul className="mt-2 list-disc pl-5 text-sm text-slate-700">
          {band.notes.map((note) => (
            <li key={note}>{note}</li>
          ))}
        </ul>
      )}
    </section>
  );
}

function change(piece: PieceChange, units: Units): string {
  if (Math.abs(piece.changeM) < 0.0005) return "no change";
  return `${formatCutLength(piece.newLengthM, units)} (${piece.changeM < 0 ? "cut" : "add"} ${formatCutLength(Math.abs(piece.changeM), units)})`;
}

function TrimTable({ rule, engine, units }: { rule: PieceChange[]; engine: PieceChange[] | null; units: Units }) {
  const first = engine ?? rule;
  return (
    <table className={`${tableClass} mb-3`} aria-label="How much to cut or add">
      <caption>How much to cut or add on each piece</caption>
      <thead>
        <tr>
          <th scope="col">Piece</th>
          <th scope="col">Count</th>
          <th scope="col">As built</th>
          <th scope="col">Rule of thumb (length ∝ 1/f)</th>
          <th scope="col">The engine (geometry re-solved)</th>
          <th scope="col">First step: half the change</th>
        </tr>
      </thead>
      <tbody>
        {rule.map((piece, index) => (
          <tr key={piece.label}>
            <th scope="row">{piece.label}</th>
            <td>{piece.count}</td>
            <td>{formatCutLength(piece.lengthM, units)}</td>
            <td data-figure="trim-rule">{change(piece, units)}</td>
            <td data-figure="trim-engine">{engine ? change(engine[index], units) : "—"}</td>
            <td className="font-bold" data-figure="trim-first-step">
              {Math.abs(first[index].firstStepM) < 0.0005 ? "—" : `${first[index].firstStepM < 0 ? "cut" : "add"} ${formatCutLength(Math.abs(first[index].firstStepM), units)}`}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

export function SweepAnalysis({ sweep, units, planChanged }: { sweep: SweepDetailDto; units: Units; planChanged: boolean }) {
  const { analysis } = sweep;
  const { trim } = analysis;
  return (
    <div>
      {planChanged && (
        <Notice tone="info" title="The plan has changed since this sweep">
          The figures below compare the sweep with the plan as it stood at the upload; the charts show it over the plan as it is now.
        </Notice>
      )}
      {analysis.bands.map((band) => (
        <BandFigures key={band.band} band={band} />
      ))}
      <details className="mb-4 text-sm text-slate-700" open={sweep.place === "radio-end"}>
        <summary className="min-h-11 cursor-pointer py-2 font-bold text-copper-700">How the feed point and the radio end were worked out</summary>
        <ul className="list-disc pl-5" aria-label="How the feedline was taken into account">
          {analysis.explanation.map((line) => (
            <li key={line}>{line}</li>
          ))}
        </ul>
      </details>

      <h4 className="mb-2 font-bold">Trim advice</h4>
      {analysis.bands.every((band) => band.verdict === "on-target") && (
        <p className="mb-2 font-bold text-copper-800" data-figure="trim-verdict">
          On target: leave the wire as it is. The changes below are smaller than a sweep&apos;s step or a careful cut.
        </p>
      )}
      {trim.ok ? (
        <>
          <p className="mb-2 text-sm text-slate-700">
            {trim.builtFrom === "plan" ? "From the plan's cut lengths" : "From the lengths as built that the uploader gave"} and the measured resonance
            {trim.result.elements.length > 1 ? "s" : ""} (
            {trim.result.elements.map((element) => `${element.band}: ${formatMHz(element.measuredMHz)} for ${formatMHz(element.targetMHz)}`).join("; ")}). The rule of
            thumb scales the length by f measured / f target (common practice); the engine re-solves the geometry for the length that moves its resonance by the
            measured ratio.
          </p>
          <TrimTable rule={trim.result.rule} engine={trim.result.engine} units={units} />
          <ul className="mb-3 list-disc pl-5" aria-label="What to do">
            {trim.result.advice.map((line) => (
              <li key={line}>{line}</li>
            ))}
          </ul>
        </>
      ) : (
        <p className="mb-3 text-slate-800" data-figure="trim-unavailable">
          {trim.reason}
        </p>
      )}
      <Notice tone="caution" title="Before you cut">
        <ul className="list-disc pl-5">
          {TRIM_CAUTIONS.map((caution) => (
            <li key={caution}>{caution}</li>
          ))}
        </ul>
        <p className="mt-2 font-bold">{CLOSING_CAUTION}</p>
      </Notice>
    </div>
  );
}
