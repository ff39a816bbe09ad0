import type { Metadata } from "next";
import Link from "next/link";
import { StateBadge } from "@/components/gear/badges";
import { BookingSteps } from "@/components/lending/booking-steps";
import { StationKitBoard, type BoardSlot } from "@/components/station-kits/station-kit-board";
import { ButtonLink } from "@/components/ui/button";
import { Card, EmptyState, Notice, PageHeader } from "@/components/ui/notice";
import { gearKindLabels } from "@/lib/gear/kinds";
import { formatRangeInZone } from "@/lib/time";
import { loadOrNotFound } from "@/server/page-data";
import { stepsFor } from "@/server/services/lending";
import { dayKit } from "@/server/services/station-kits";
import { requirePageViewer } from "@/server/session";

export const metadata: Metadata = { title: "Station kits" };

export default async function StationKitsPage({ params }: { params: Promise<{ dayId: string }> }) {
  const { actor, member } = await requirePageViewer("loans.manage");
  const { dayId } = await params;
  const { day, slots, wholeDay, notBookableReason } = await loadOrNotFound(dayId, (id) => dayKit(actor, id));
  const boardSlots: BoardSlot[] = slots.map(({ slot, booked, feedline }) => ({
    id: slot.id,
    name: slot.name,
    bands: slot.bands,
    runM: slot.feedlineRun.lengthM,
    runIsOverride: slot.feedlineRun.overrideM !== null,
    mastHeightM: slot.summary.mastHeightM,
    feedline,
    booked: booked.map((booking) => ({ booking, steps: stepsFor(actor, booking), isBorrower: booking.borrowerId === actor.id })),
  }));

  return (
    <>
      <PageHeader title={`Station kits: ${day.title}`}>
        <ButtonLink href={`/antenna-days/${day.id}`} variant="secondary">
          Back to the day
        </ButtonLink>
      </PageHeader>
      <p className="mb-4 max-w-3xl">
        {formatRangeInZone(day.startsAt, day.endsAt, day.timeZone)} at {day.site.name}. Each item is booked for the whole day, approved at once. A coax run booked here becomes the
        slot&apos;s feedline: its plan, plan screen and station sheet are computed with that run from then on. Loss and SWR at the radio are the engine&apos;s, for each actual run at the
        slot&apos;s bands.
      </p>
      {notBookableReason && <Notice tone="caution" title={notBookableReason} />}
      {slots.length === 0 ? <EmptyState title="This day has no station slots yet." /> : <StationKitBoard slots={boardSlots} units={member.units} bookable={notBookableReason === null} />}
      {wholeDay.length > 0 && (
        <Card title="Booked for the day, no slot named">
          <ul className="divide-y divide-slate-200" aria-label="Booked for the day">
            {wholeDay.map((booking) => (
              <li key={booking.id} className="py-2">
                <p>
                  <StateBadge state={booking.state} />{" "}
                  <Link href={`/gear/${booking.itemId}`} className="font-bold">
                    {booking.itemLabelCode} {booking.itemName}
                  </Link>{" "}
                  · {gearKindLabels[booking.itemKind]} · {booking.borrowerName}
                </p>
                <BookingSteps booking={booking} steps={stepsFor(actor, booking)} isBorrower={booking.borrowerId === actor.id} />
              </li>
            ))}
          </ul>
        </Card>
      )}
    </>
  );
}
