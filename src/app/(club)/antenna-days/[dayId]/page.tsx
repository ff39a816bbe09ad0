import type { Metadata } from "next";
import Link from "next/link";
import { DayActions } from "@/components/antenna-days/day-actions";
import { AddShiftForm, ShiftList } from "@/components/antenna-days/shift-list";
import { SitePlan, type PlanSlot } from "@/components/antenna-days/site-plan";
import { DayStatusBadge } from "@/components/antenna-days/status-badge";
import { ButtonLink, buttonClass } from "@/components/ui/button";
import { Card, EmptyState, Notice, PageHeader } from "@/components/ui/notice";
import { bandByName, type ItuRegion } from "@/lib/antenna/bands";
import { MODE_DUTY } from "@/lib/antenna/exposure";
import { isEditable } from "@/lib/antenna-days/status";
import { CLOSING_CAUTION, LABELLED_SAFETY_CAUTIONS } from "@/lib/plan-screen/cautions";
import { formatDistance, type Units } from "@/lib/plan-screen/format";
import { bookedFeedlineText, type BookedFeedline } from "@/lib/station-kits/booked-feedline";
import { formatRangeInZone } from "@/lib/time";
import { loadOrNotFound } from "@/server/page-data";
import { can } from "@/server/policy";
import { getClubSettings } from "@/server/services/accounts";
import { getDay } from "@/server/services/antenna-days";
import { listShiftsOfDay } from "@/server/services/shifts";
import { getSite } from "@/server/services/sites";
import { bookedFeedlines, listSlots, type SlotDto } from "@/server/services/station-slots";
import { requirePageViewer } from "@/server/session";

export const metadata: Metadata = { title: "Antenna day" };

function SlotFacts({ slot, feedline, units }: { slot: SlotDto; feedline: BookedFeedline | undefined; units: Units }) {
  const run = slot.feedlineRun;
  const m = (metres: number) => formatDistance(metres, units);
  const facts: [string, string][] = [
    ["Bands", slot.bands.join(", ")],
    ["Power and mode", `${slot.powerW} W, ${MODE_DUTY[slot.mode].label}`],
    ["Antenna", slot.summary.familyLabel],
    ["Mast", `${m(slot.summary.mastHeightM)} high, feed point at ${m(slot.summary.feedHeightM)}`],
    ["Wire span", m(slot.summary.wireSpanM)],
    ["Guy anchors", `3 at ${m(slot.summary.guyRadiusM)} from the mast`],
    ["Fall zone", m(slot.summary.fallZoneRadiusM)],
    ["RF-exposure distance (public)", m(slot.summary.exposureDistanceM)],
    [
      "Feedline run",
      run.overrideM !== null
        ? `${m(run.lengthM)} (set by the coordinator; computed ${m(run.computedM)})`
        : `${m(run.lengthM)} = ${m(run.groundM)} to the tent + ${m(run.mastM)} up the mast + ${m(run.slackM)} slack`,
    ],
    ...(feedline ? [["Feedline booked", `${bookedFeedlineText(feedline, units)} (the plan uses it)`] as [string, string]] : []),
  ];
  return (
    <dl className="grid gap-x-6 gap-y-1 text-sm sm:grid-cols-2">
      {facts.map(([term, value]) => (
        <div key={term} className="flex flex-wrap gap-x-2">
          <dt className="font-bold text-slate-700">{term}:</dt>
          <dd>{value}</dd>
        </div>
      ))}
    </dl>
  );
}

export default async function AntennaDayPage({ params }: { params: Promise<{ dayId: string }> }) {
  const { actor, member } = await requirePageViewer("antennaDays.view");
  const { dayId } = await params;
  const day = await loadOrNotFound(dayId, (id) => getDay(actor, id));
  const [slots, shiftsBySlot, site, settings] = await Promise.all([listSlots(actor, day.id), listShiftsOfDay(actor, day.id), getSite(actor, day.site.id), getClubSettings()]);
  const region = settings.ituRegion as ItuRegion;
  const feedlines = await bookedFeedlines(slots.map((slot) => slot.id));
  const manage = can(actor, "antennaDays.manage") && isEditable(day.status);
  const planSlots: PlanSlot[] = slots.map((slot) => ({
    id: slot.id,
    name: slot.name,
    bands: slot.bands.flatMap((name) => {
      const band = bandByName(name, region);
      return band ? [{ name: band.name, lowMHz: band.lowMHz, highMHz: band.highMHz }] : [];
    }),
    x: slot.x,
    y: slot.y,
    azimuthDeg: slot.azimuthDeg,
    tentX: slot.tentX,
    tentY: slot.tentY,
    summary: slot.summary,
  }));

  return (
    <>
      <PageHeader title={day.title}>
        <DayStatusBadge status={day.status} />
        {/* A plain link: the file is a download, not a page. */}
        <a className={buttonClass("secondary")} href={`/api/antenna-days/${day.id}/ics`} download>
          Add to my calendar (.ics)
        </a>
      </PageHeader>
      {can(actor, "antennaDays.manage") && (
        <div className="mb-6">
          <DayActions dayId={day.id} status={day.status} nextStatuses={day.nextStatuses} editable={isEditable(day.status)} />
        </div>
      )}
      {day.status === "cancelled" && <Notice tone="caution" title="This antenna day is cancelled." />}
      <div className="grid gap-6 lg:grid-cols-2">
        <Card title="When and where">
          <dl className="space-y-1">
            <div>
              <dt className="inline font-bold">When: </dt>
              <dd className="inline">
                {formatRangeInZone(day.startsAt, day.endsAt, day.timeZone)} ({day.timeZone})
              </dd>
            </div>
            <div>
              <dt className="inline font-bold">Site: </dt>
              <dd className="inline">
                <Link href={`/sites/${day.site.id}`}>{day.site.name}</Link>
              </dd>
            </div>
            {day.meetingPoint && (
              <div>
                <dt className="inline font-bold">Meeting point: </dt>
                <dd className="inline">{day.meetingPoint}</dd>
              </div>
            )}
            <div>
              <dt className="inline font-bold">Safety lead: </dt>
              <dd className="inline">
                {day.safetyLead.name}
                {day.safetyLead.callSign && ` (${day.safetyLead.callSign})`}
              </dd>
            </div>
          </dl>
          {day.description && <p className="mt-3 whitespace-pre-line">{day.description}</p>}
        </Card>
        <Card title="Safety on the day">
          <ul className="list-disc space-y-1 pl-5 text-sm">
            {LABELLED_SAFETY_CAUTIONS.map(({ label, text }) => (
              <li key={label}>
                <strong>{label}:</strong> {text}
              </li>
            ))}
          </ul>
          <p className="mt-3 font-bold">{CLOSING_CAUTION}</p>
        </Card>
      </div>

      <Card title={`Site plan: ${site.name}`}>
        {slots.length === 0 && site.hazards.length === 0 ? (
          <EmptyState title="Nothing on the plan yet." />
        ) : (
          <SitePlan site={{ name: site.name, widthM: site.widthM, depthM: site.depthM, hazards: site.hazards }} slots={planSlots} editable={manage} />
        )}
      </Card>

      <section aria-labelledby="slots-heading">
        <div className="mb-3 flex flex-wrap items-center justify-between gap-2">
          <h2 id="slots-heading">Station slots</h2>
          <div className="flex flex-wrap gap-2">
            {can(actor, "loans.manage") && slots.length > 0 && (
              <ButtonLink href={`/antenna-days/${day.id}/kit`} variant="secondary">
                Station kits
              </ButtonLink>
            )}
            {manage && <ButtonLink href={`/antenna-days/${day.id}/slots/new`}>Add a station slot</ButtonLink>}
          </div>
        </div>
        {slots.length === 0 && <EmptyState title="No station slots yet." />}
        {slots.map((slot) => (
          <section key={slot.id} id={`slot-${slot.id}`} aria-label={`Station slot ${slot.name}`} className="mb-6 scroll-mt-4 rounded-xl border border-slate-200 bg-white p-4 shadow-sm sm:p-6">
            <div className="mb-3 flex flex-wrap items-center justify-between gap-2">
              <h3 className="text-lg font-bold">{slot.name}</h3>
              <div className="flex flex-wrap gap-2">
                <ButtonLink href={`/antenna-days/${day.id}/slots/${slot.id}/plan`} variant="secondary" aria-label={`Antenna plan of ${slot.name}`}>
                  Antenna plan
                </ButtonLink>
                <ButtonLink href={`/antenna-days/${day.id}/slots/${slot.id}/sheet`} variant="secondary" aria-label={`Station sheet of ${slot.name}`}>
                  Station sheet
                </ButtonLink>
                {manage && (
                  <ButtonLink href={`/antenna-days/${day.id}/slots/${slot.id}`} variant="quiet" aria-label={`Edit ${slot.name}`}>
                    Edit slot
                  </ButtonLink>
                )}
              </div>
            </div>
            <SlotFacts slot={slot} feedline={feedlines.get(slot.id)} units={member.units} />
            <h4 className="mt-4 mb-1 font-bold">Shifts</h4>
            <ShiftList slotName={slot.name} shifts={shiftsBySlot[slot.id] ?? []} manage={manage} timeZone={day.timeZone} />
            {manage && <AddShiftForm slotId={slot.id} slotName={slot.name} defaults={{ startsAtLocal: day.startsAtLocal, endsAtLocal: day.endsAtLocal }} />}
          </section>
        ))}
      </section>
    </>
  );
}
