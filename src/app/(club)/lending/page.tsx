import type { Metadata } from "next";
import Link from "next/link";
import type { ReactNode } from "react";
import { StateBadge } from "@/components/gear/badges";
import { BookingSteps } from "@/components/lending/booking-steps";
import { LoansTable } from "@/components/lending/loans-table";
import { WaitlistButtons } from "@/components/lending/waitlist-offer";
import { Card, PageHeader } from "@/components/ui/notice";
import { formatInZone, formatRangeInZone } from "@/lib/time";
import { can } from "@/server/policy";
import { getClubSettings } from "@/server/services/accounts";
import { isEditable } from "@/lib/antenna-days/status";
import { listDays } from "@/server/services/antenna-days";
import { lendingDesk, listBorrowers, stepsFor, type BookingDto } from "@/server/services/lending";
import { antennaDayLabels } from "@/server/services/station-kits";
import { requirePageViewer } from "@/server/session";

export const metadata: Metadata = { title: "Lending desk" };

export default async function LendingPage() {
  const { actor } = await requirePageViewer("loans.request");
  const [{ timeZone }, desk] = await Promise.all([getClubSettings(), lendingDesk(actor)]);
  const keeper = can(actor, "loans.manage");
  const borrowers = can(actor, "loans.viewAll") ? await listBorrowers(actor) : null;
  const now = new Date();
  const [dayLabels, kitDays] = await Promise.all([
    antennaDayLabels([...desk.mine, ...desk.toApprove, ...desk.toHandOut, ...desk.out, ...desk.overdue, ...desk.toCoSign]),
    keeper ? listDays(actor, { from: now }).then((days) => days.filter((day) => isEditable(day.status) && new Date(day.endsAt) > now)) : [],
  ]);

  // `anchored`: each booking has an id to link to (/lending#booking-<id>, from e-mail and the calendar); one list only, ids are unique.
  const list = (bookings: BookingDto[], empty: string, label: string, anchored = false): ReactNode =>
    bookings.length === 0 ? (
      <p className="text-slate-600">{empty}</p>
    ) : (
      <ul className="divide-y divide-slate-200" aria-label={label}>
        {bookings.map((booking) => (
          <li key={booking.id} id={anchored ? `booking-${booking.id}` : undefined} className="scroll-mt-4 py-3" data-testid={`booking-${booking.itemLabelCode}`}>
            <p>
              <StateBadge state={booking.state} overdue={booking.overdue} />{" "}
              <Link href={`/gear/${booking.itemId}`} className="font-bold">
                {booking.itemLabelCode} {booking.itemName}
              </Link>{" "}
              · {booking.borrowerName} · {formatRangeInZone(booking.startsAt, booking.endsAt, timeZone)}
              {dayLabels.has(booking.id) && <span> · for {dayLabels.get(booking.id)}</span>}
            </p>
            {booking.awaitingCoSign && <p className="text-sm text-slate-700">Waits for a mentor&apos;s co-sign before a steward can approve it.</p>}
            {booking.overdue && <p className="text-sm font-bold text-danger-600">Overdue since {formatInZone(booking.endsAt, timeZone)}.</p>}
            {booking.declineReason && <p className="text-sm">Declined: {booking.declineReason}</p>}
            {booking.note && <p className="text-sm text-slate-700">{booking.note}</p>}
            <BookingSteps booking={booking} steps={stepsFor(actor, booking)} isBorrower={booking.borrowerId === actor.id} />
          </li>
        ))}
      </ul>
    );

  const offers = desk.myWaitlist.filter((entry) => entry.state === "offered");
  const waiting = desk.myWaitlist.filter((entry) => entry.state === "waiting");

  return (
    <>
      <PageHeader title="Lending desk" />
      {offers.length > 0 && (
        <Card title="Offered to you">
          <ul className="divide-y divide-slate-200">
            {offers.map((entry) => (
              <li key={entry.id} className="py-3">
                <p>
                  <Link href={`/gear/${entry.itemId}`} className="font-bold">
                    {entry.itemLabelCode} {entry.itemName}
                  </Link>{" "}
                  came free for {formatRangeInZone(entry.startsAt, entry.endsAt, timeZone)}. It is held for you until{" "}
                  <span className="font-bold">{entry.offerExpiresAt && formatInZone(entry.offerExpiresAt, timeZone)}</span>; after that it goes to the next in line.
                </p>
                <WaitlistButtons entryId={entry.id} offered />
              </li>
            ))}
          </ul>
        </Card>
      )}
      {keeper && (
        <>
          <Card title={`Overdue (${desk.overdue.length})`}>{list(desk.overdue, "Nothing is overdue.", "Overdue loans")}</Card>
          <Card title={`Requests to approve (${desk.toApprove.length})`}>{list(desk.toApprove, "No requests wait for approval.", "Requests to approve")}</Card>
          <Card title={`To hand out in the next day (${desk.toHandOut.length})`}>{list(desk.toHandOut, "Nothing to hand out soon.", "To hand out")}</Card>
          <Card title={`Out now (${desk.out.length})`}>{list(desk.out, "Nothing else is out.", "Out now")}</Card>
          <Card title="Station kits">
            {kitDays.length === 0 ? (
              <p className="text-slate-600">No antenna day to come needs its kit booked.</p>
            ) : (
              <ul className="divide-y divide-slate-200" aria-label="Station kits of antenna days to come">
                {kitDays.map((day) => (
                  <li key={day.id} className="py-2">
                    <Link href={`/antenna-days/${day.id}/kit`} className="font-bold">
                      Station kits for {day.title}
                    </Link>{" "}
                    · {formatRangeInZone(day.startsAt, day.endsAt, timeZone)}
                  </li>
                ))}
              </ul>
            )}
          </Card>
        </>
      )}
      {desk.toCoSign.length > 0 && <Card title="Newcomers' requests to co-sign">{list(desk.toCoSign, "", "Requests to co-sign")}</Card>}
      <Card title="Your bookings">{list(desk.mine, "You have no bookings. Find something on the gear shelf.", "Your bookings", true)}</Card>
      {waiting.length > 0 && (
        <Card title="You are waiting for">
          <ul className="divide-y divide-slate-200">
            {waiting.map((entry) => (
              <li key={entry.id} className="py-3">
                <Link href={`/gear/${entry.itemId}`} className="font-bold">
                  {entry.itemLabelCode} {entry.itemName}
                </Link>{" "}
                for {formatRangeInZone(entry.startsAt, entry.endsAt, timeZone)}
                <WaitlistButtons entryId={entry.id} offered={false} />
              </li>
            ))}
          </ul>
        </Card>
      )}
      <Card title={keeper ? "All loans" : "Your loans, past and present"}>
        <LoansTable timeZone={timeZone} borrowers={borrowers} />
      </Card>
    </>
  );
}
