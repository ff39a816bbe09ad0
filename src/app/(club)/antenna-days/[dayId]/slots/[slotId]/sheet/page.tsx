import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { CutSheetTable } from "@/components/antenna-plan/cut-sheet-table";
import { PlanParameters } from "@/components/antenna-plan/plan-parameters";
import { tableClass } from "@/components/antenna-plan/table-class";
import { ButtonLink } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { MODE_DUTY } from "@/lib/antenna/exposure";
import type { PlanResult } from "@/lib/antenna/plan";
import { planRequestSchema } from "@/lib/antenna/plan-schema";
import { EngineInputError } from "@/lib/antenna/problems";
import { bandEdgePoints } from "@/lib/plan-screen/band-edges";
import { CLOSING_CAUTION, LABELLED_SAFETY_CAUTIONS } from "@/lib/plan-screen/cautions";
import { formatDistance, formatImpedance, formatMHz, formatSwr, type Units } from "@/lib/plan-screen/format";
import { bookedFeedlineText } from "@/lib/station-kits/booked-feedline";
import { formatInZone, formatRangeInZone } from "@/lib/time";
import { runPlan } from "@/server/engine/run";
import { loadOrNotFound } from "@/server/page-data";
import { getSlotWithFeedline } from "@/server/services/station-slots";
import { requirePageViewer } from "@/server/session";
import { PrintButton } from "./print-button";
import "./station-sheet.css";

export const metadata: Metadata = { title: "Station sheet" };

/** The plan as saved, or the engine's problems with it. */
async function planOrProblems(request: unknown): Promise<{ result: PlanResult } | { problems: string[] }> {
  try {
    return { result: await runPlan(request) };
  } catch (error) {
    if (error instanceof EngineInputError) return { problems: error.problems };
    throw error;
  }
}

function ExpectedSwr({ result }: { result: PlanResult }) {
  return (
    <table className={tableClass} aria-label="Expected SWR">
      <caption>Expected SWR at the radio (and at the feed point)</caption>
      <thead>
        <tr>
          <th scope="col">Band</th>
          <th scope="col">Low edge</th>
          <th scope="col">Centre</th>
          <th scope="col">High edge</th>
          <th scope="col">2:1 at the radio</th>
          <th scope="col">Resonance</th>
        </tr>
      </thead>
      <tbody>
        {result.bands.map((band) => {
          const edges = bandEdgePoints(band);
          const cell = (radio: number, feed: number) => `${formatSwr(radio)} (${formatSwr(feed)})`;
          return (
            <tr key={band.band.name}>
              <th scope="row">{band.band.name}</th>
              <td>
                {cell(edges.low.radio.swr, edges.low.feed.swr)} at {edges.low.mhz.toFixed(3)}
              </td>
              <td>
                {cell(band.swrAtCentre.radio, band.swrAtCentre.feed)} at {band.centreMHz.toFixed(3)}
              </td>
              <td>
                {cell(edges.high.radio.swr, edges.high.feed.swr)} at {edges.high.mhz.toFixed(3)}
              </td>
              <td>{band.bandFitsUnder2to1 ? "whole band, no tuner" : "not the whole band: tuner or trim"}</td>
              <td>{band.zeroReactanceMHz === null ? "outside the sweep" : formatMHz(band.zeroReactanceMHz)}</td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}

function SafetyBlock({ result, fallZoneM, guyRadiusM, exposureM, units }: { result: PlanResult | null; fallZoneM: number; guyRadiusM: number; exposureM: number; units: Units }) {
  const ends = result?.bands.flatMap((band) => band.endVoltages.points.map((point) => ({ ...point, band: band.band.name }))) ?? [];
  const highest = ends.reduce<(typeof ends)[number] | null>((top, point) => (!top || point.rmsV > top.rmsV ? point : top), null);
  return (
    <section className="sheet-safety mt-6 rounded-lg border-2 border-slate-800 p-4" aria-labelledby="sheet-safety">
      <h2 id="sheet-safety">Safety</h2>
      <dl className="my-2 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
        <dt className="font-bold">RF exposure</dt>
        <dd>
          Keep the public at least <strong>{formatDistance(exposureM, units)}</strong> from the antenna while transmitting (general-population limit, largest over
          the station&apos;s bands).
        </dd>
        <dt className="font-bold">Fall zone</dt>
        <dd>
          <strong>{formatDistance(fallZoneM, units)}</strong> around the mast: no power line, path or tent inside it.
        </dd>
        <dt className="font-bold">Guying</dt>
        <dd>Anchors about {formatDistance(guyRadiusM, units)} from the mast.</dd>
        <dt className="font-bold">End voltage</dt>
        <dd>
          {highest
            ? `Up to ${Math.round(highest.rmsV)} V RMS at the ${highest.label.toLowerCase()} (${highest.band}) at ${result!.bands[0].endVoltages.powerW} W${highest.dangerousToTouch ? ": DANGEROUS TO TOUCH while transmitting" : ""}.`
            : "Not computed: fix the plan first."}
        </dd>
      </dl>
      <ul className="list-disc pl-5">
        {LABELLED_SAFETY_CAUTIONS.map(({ label, text }) => (
          <li key={label}>
            <strong>{label}:</strong> {text}
          </li>
        ))}
      </ul>
      <p className="mt-3 text-lg font-bold">{CLOSING_CAUTION}</p>
    </section>
  );
}

export default async function StationSheetPage({ params }: { params: Promise<{ dayId: string; slotId: string }> }) {
  const { actor, member } = await requirePageViewer("plans.view");
  const { dayId, slotId } = await params;
  const { slot, day, site, planRequest, shifts, feedline } = await loadOrNotFound(slotId, (id) => getSlotWithFeedline(actor, id));
  if (slot.dayId !== dayId) notFound();
  const computed = await planOrProblems(planRequest);
  const result = "result" in computed ? computed.result : null;
  const parameters = planRequestSchema.safeParse(planRequest);
  const units = member.units;

  return (
    <article className="station-sheet mx-auto max-w-4xl bg-white p-2 text-slate-900">
      <div className="no-print mb-4 flex flex-wrap gap-2">
        <PrintButton />
        <ButtonLink href={`/antenna-days/${day.id}/slots/${slot.id}/plan`} variant="secondary">
          Antenna plan
        </ButtonLink>
        <ButtonLink href={`/antenna-days/${day.id}`} variant="quiet">
          Back to {day.title}
        </ButtonLink>
      </div>

      <header className="mb-4">
        <h1>Station sheet: {slot.name}</h1>
        <p>
          {day.title}, {formatRangeInZone(day.startsAt, day.endsAt, day.timeZone)} ({day.timeZone}), at {site.name}
        </p>
        {day.meetingPoint && <p>Meeting point: {day.meetingPoint}</p>}
        <p>
          Safety lead: {day.safetyLead.name}
          {day.safetyLead.callSign ? ` (${day.safetyLead.callSign})` : ""}
        </p>
      </header>

      <section className="mb-4" aria-labelledby="sheet-station">
        <h2 id="sheet-station">Station</h2>
        <p>
          {slot.bands.join(", ")} · {slot.powerW} W · {MODE_DUTY[slot.mode].label} · mast at {slot.x.toFixed(0)} m east, {slot.y.toFixed(0)} m north on the site
          plan, wire toward {slot.azimuthDeg.toFixed(0)}°
        </p>
        {parameters.success && (
          <div className="mt-2">
            <PlanParameters parameters={parameters.data} units={units} />
          </div>
        )}
      </section>

      {"problems" in computed && (
        <Notice tone="danger" title="The engine cannot compute this station's plan">
          <ul className="list-disc pl-5">
            {computed.problems.map((problem) => (
              <li key={problem}>{problem}</li>
            ))}
          </ul>
        </Notice>
      )}

      {result && (
        <>
          <section className="mb-4" aria-labelledby="sheet-cut">
            <h2 id="sheet-cut">Cut sheet</h2>
            <CutSheetTable cutSheet={result.cutSheet} units={units} caption={`${result.label}: cut each piece to the bold length`} />
            <p className="mt-1 text-sm">{result.cutSheet.wrapNote}</p>
          </section>

          <section className="mb-4" aria-labelledby="sheet-swr">
            <h2 id="sheet-swr">Expected SWR</h2>
            <ExpectedSwr result={result} />
            <p className="mt-1 text-sm">
              Feed-point impedance at the centre: {result.bands.map((band) => `${band.band.name} ${formatImpedance(band.feedImpedanceAtCentre)}`).join("; ")}.
            </p>
          </section>

          <section className="mb-4" aria-labelledby="sheet-feed">
            <h2 id="sheet-feed">Feedline and {result.transformer.kind}</h2>
            {feedline && (
              <p className="font-bold" data-figure="slot-feedline">
                feedline: {bookedFeedlineText(feedline, units)}
              </p>
            )}
            <p>
              {formatDistance(result.feedline.lengthM, units)} of {result.feedline.label} ({result.feedline.z0Ohms} Ω) through a {result.transformer.label}; loss at
              the centre {result.bands.map((band) => `${band.band.name} ${band.loss.matchedDb.toFixed(1)} dB matched, ${band.loss.totalDb.toFixed(1)} dB in all`).join("; ")}.
            </p>
          </section>
        </>
      )}

      <section className="mb-4" aria-labelledby="sheet-shifts">
        <h2 id="sheet-shifts">Shifts</h2>
        {shifts.length === 0 ? (
          <p>No shifts yet.</p>
        ) : (
          <table className={tableClass} aria-label="Shifts">
            <thead>
              <tr>
                <th scope="col">When</th>
                <th scope="col">Operators</th>
                <th scope="col">Places</th>
              </tr>
            </thead>
            <tbody>
              {shifts.map((shift) => (
                <tr key={shift.id}>
                  <th scope="row">{formatRangeInZone(shift.startsAt, shift.endsAt, day.timeZone)}</th>
                  <td>{shift.people.length === 0 ? "—" : shift.people.map((person) => (person.callSign ? `${person.name} (${person.callSign})` : person.name)).join(", ")}</td>
                  <td>
                    {shift.taken} of {shift.capacity}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>

      <SafetyBlock result={result} fallZoneM={slot.summary.fallZoneRadiusM} guyRadiusM={slot.summary.guyRadiusM} exposureM={slot.summary.exposureDistanceM} units={units} />
      <p className="mt-4 text-xs">Printed from Guyline on {formatInZone(new Date(), day.timeZone)}. Figures are screening numbers for planning.</p>
    </article>
  );
}
