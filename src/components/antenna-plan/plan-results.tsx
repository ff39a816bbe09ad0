"use client";

// What the engine computed for a plan: the summary figures, the cut sheet, the charts, the
// end voltages, the RF-exposure distances, the matching device and the feedline, and the
// cautions. The summary figures carry data-figure names for tests and readers alike.
import { memo } from "react";
import { Notice } from "@/components/ui/notice";
import type { PlanBand, PlanResult } from "@/lib/antenna/plan";
import { bandEdgePoints } from "@/lib/plan-screen/band-edges";
import { CLOSING_CAUTION, PLAN_SCREEN_CAUTIONS } from "@/lib/plan-screen/cautions";
import { formatBandwidth, formatCutLength, formatDistance, formatImpedance, formatMHz, formatSigned, formatSwr, type Units } from "@/lib/plan-screen/format";
import { Figure } from "@/components/ui/figure";
import { CurrentChart, ImpedanceChart, SwrChart, type MeasuredOverlay } from "./charts";
import { CutSheetTable } from "./cut-sheet-table";
import { tableClass } from "./table-class";

function BandResults({ band, result, units, measured }: { band: PlanBand; result: PlanResult; units: Units; measured?: MeasuredOverlay }) {
  const edges = bandEdgePoints(band);
  const dangerous = band.endVoltages.points.filter((point) => point.dangerousToTouch);
  return (
    <section aria-labelledby={`band-${band.band.name}`} className="mb-8">
      <h3 id={`band-${band.band.name}`} className="mb-3 text-lg font-bold">
        {band.band.name} ({formatMHz(band.band.lowMHz)} – {formatMHz(band.band.highMHz)})
      </h3>
      <dl className="mb-4 grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
        <Figure name="resonance" label="Resonance (X crosses zero)">
          {band.zeroReactanceMHz === null ? "outside the sweep" : formatMHz(band.zeroReactanceMHz)}
        </Figure>
        <Figure name="feed-impedance" label={`Feed-point impedance at ${band.centreMHz.toFixed(3)} MHz`}>
          {formatImpedance(band.feedImpedanceAtCentre)}
        </Figure>
        <Figure name="radio-impedance" label="Impedance at the radio">
          {formatImpedance(band.radioImpedanceAtCentre)}
        </Figure>
        <Figure name="swr-centre-radio" label="SWR at the radio, band centre">
          {formatSwr(band.swrAtCentre.radio)}
        </Figure>
        <Figure name="swr-edges-radio" label="SWR at the radio, band edges">
          {formatSwr(edges.low.radio.swr)} / {formatSwr(edges.high.radio.swr)}
        </Figure>
        <Figure name="bandwidth-radio" label="2:1 bandwidth at the radio">
          {formatBandwidth(band.swrBandwidth.radio)}
        </Figure>
        <Figure name="loss" label="Feedline loss at the centre, matched / total">
          {band.loss.matchedDb.toFixed(2)} dB / {band.loss.totalDb.toFixed(2)} dB
        </Figure>
        <Figure name="tuner" label="Whole band under 2:1 without a tuner">
          {band.bandFitsUnder2to1 ? "Yes" : "No: a tuner or trimming is needed"}
        </Figure>
      </dl>

      <SwrChart band={band} transformerLabel={result.transformer.label} measured={measured} />
      <ImpedanceChart band={band} measured={measured} />
      <CurrentChart band={band} currents={band.currents} units={units} />

      <h4 className="mb-2 font-bold">RF voltage at the wire ends at {band.endVoltages.powerW} W</h4>
      {dangerous.length > 0 && (
        <Notice tone="danger" title="High RF voltage at the wire ends">
          {dangerous.map((point) => point.label).join(", ")} reach more than {band.endVoltages.thresholdVrms} V RMS while transmitting. {band.endVoltages.caution}
        </Notice>
      )}
      <table className={`${tableClass} mb-2`} aria-label={`RF voltage at the wire ends, ${band.band.name}`}>
        <thead>
          <tr>
            <th scope="col">End</th>
            <th scope="col">Height</th>
            <th scope="col">RMS voltage</th>
            <th scope="col">Dangerous to touch</th>
          </tr>
        </thead>
        <tbody>
          {band.endVoltages.points.map((point) => (
            <tr key={point.label}>
              <th scope="row">{point.label}</th>
              <td>{formatDistance(point.position[2], units)}</td>
              <td>{Math.round(point.rmsV)} V</td>
              <td>{point.dangerousToTouch ? "Yes" : "No"}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mb-6 text-sm text-slate-700">
        Threshold {band.endVoltages.thresholdVrms} V RMS: {band.endVoltages.thresholdReason}
      </p>

      <h4 className="mb-2 font-bold">RF-exposure distances at {band.centreMHz.toFixed(3)} MHz</h4>
      <table className={`${tableClass} mb-2`} aria-label={`RF-exposure distances, ${band.band.name}`}>
        <thead>
          <tr>
            <th scope="col">Limit</th>
            <th scope="col">Keep at least (with ground reflection)</th>
            <th scope="col">Free space</th>
          </tr>
        </thead>
        <tbody>
          {band.exposure.distances.map((distance) => (
            <tr key={distance.limit}>
              <th scope="row">{distance.label}</th>
              <td className="font-bold">{formatDistance(distance.distanceM, units)}</td>
              <td>{formatDistance(distance.freeSpaceDistanceM, units)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mb-2 text-sm text-slate-700">
        Average power {band.exposure.averagePowerW.toFixed(1)} W (duty factor {band.exposure.dutyFactor}, transmitting {Math.round(band.exposure.transmitTimeFraction * 100)} % of the
        time), EIRP {band.exposure.eirpW.toFixed(1)} W.
      </p>
      <ul className="mb-4 list-disc pl-6 text-sm text-slate-700">
        {band.exposure.cautions.map((caution) => (
          <li key={caution}>{caution}</li>
        ))}
      </ul>
    </section>
  );
}

/**
 * Memoised: the plan screen re-renders on every keystroke in its form, but the results (and
 * their charts) only change when the engine answers with a new result. Its props are the
 * worker's result object, the units string and the page's measured overlay: all stable.
 */
export const PlanResults = memo(function PlanResults({ result, units, measured }: { result: PlanResult; units: Units; measured?: MeasuredOverlay }) {
  const cautions = [...new Set([...PLAN_SCREEN_CAUTIONS, ...result.cautions])].filter((caution) => caution !== CLOSING_CAUTION);
  return (
    <div>
      <h2 className="mb-3">{result.label}</h2>
      <table className={`${tableClass} mb-6`} aria-label="Tuned lengths">
        <caption>Tuned lengths (from the model) beside the rule of thumb</caption>
        <thead>
          <tr>
            <th scope="col">Element</th>
            <th scope="col">Tuned for {result.elements.length > 1 ? "each band" : "the band"}</th>
            <th scope="col">Rule of thumb</th>
            <th scope="col">Difference</th>
          </tr>
        </thead>
        <tbody>
          {result.elements.map((element) => (
            <tr key={element.band}>
              <th scope="row">
                {element.band} at {element.centreMHz.toFixed(3)} MHz
              </th>
              <td className="font-bold" data-figure={`length-${element.band}`}>
                {formatCutLength(element.lengthM, units)}
              </td>
              <td>
                {formatCutLength(element.ruleOfThumb.lengthM, units)} <span className="text-sm text-slate-600">({element.ruleOfThumb.rule})</span>
              </td>
              <td>
                {formatSigned(element.differenceFromRulePercent, 1)} %
              </td>
            </tr>
          ))}
        </tbody>
      </table>

      <div className="mb-6">
        <CutSheetTable cutSheet={result.cutSheet} units={units} />
        <p className="mt-2 text-sm text-slate-700">{result.cutSheet.wrapNote}</p>
      </div>

      <dl className="mb-6 grid gap-3 sm:grid-cols-2">
        <Figure name="transformer" label={result.transformer.kind === "balun" ? "Balun" : "Unun"}>
          {result.transformer.label}
        </Figure>
        <Figure name="feedline" label="Feedline">
          {formatDistance(result.feedline.lengthM, units)} of {result.feedline.label} ({result.feedline.z0Ohms} Ω, velocity factor {result.feedline.velocityFactor})
        </Figure>
      </dl>

      {result.bands.map((band) => (
        <BandResults key={band.band.name} band={band} result={result} units={units} measured={measured} />
      ))}

      <section aria-labelledby="plan-cautions" className="mb-6">
        <h3 id="plan-cautions" className="mb-2 text-lg font-bold">
          Safety
        </h3>
        <Notice tone="caution">
          <ul className="list-disc pl-5">
            {cautions.map((caution) => (
              <li key={caution}>{caution}</li>
            ))}
          </ul>
          <p className="mt-2 font-bold">{CLOSING_CAUTION}</p>
        </Notice>
      </section>

      <details className="mb-4 text-sm text-slate-700">
        <summary className="min-h-11 cursor-pointer py-2 font-bold text-copper-700">How this was computed</summary>
        <p>
          {result.model.segments} segments, {result.model.solves} solutions{result.model.converged ? "" : ", the length search did not fully settle"}.
        </p>
        <ul className="list-disc pl-5">
          {result.model.notes.map((note) => (
            <li key={note}>{note}</li>
          ))}
        </ul>
      </details>
    </div>
  );
});
