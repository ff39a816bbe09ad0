import type { Metadata } from "next";
import Link from "next/link";
import { ConditionBadge, StateBadge } from "@/components/gear/badges";
import { detailSummary } from "@/components/gear/describe";
import { FileUpload } from "@/components/gear/file-upload";
import { HistoryList } from "@/components/gear/history-list";
import { RetireForm } from "@/components/gear/retire-form";
import { BookingSteps } from "@/components/lending/booking-steps";
import { RequestForm } from "@/components/lending/request-form";
import { WaitlistButtons } from "@/components/lending/waitlist-offer";
import { ButtonLink } from "@/components/ui/button";
import { DeleteButton } from "@/components/ui/delete-button";
import { Card, Notice, PageHeader } from "@/components/ui/notice";
import { approvalRuleLabels, gearKindLabels, type ShelfCondition } from "@/lib/gear/kinds";
import { nextActionFor, type NextAction } from "@/lib/lending/next-action";
import { formatInZone, formatRangeInZone, instantToDate } from "@/lib/time";
import { loadOrNotFound } from "@/server/page-data";
import { can, canCoSignLoan, loanNeedsCoSign } from "@/server/policy";
import { getClubSettings } from "@/server/services/accounts";
import { getItem, listItemFiles } from "@/server/services/gear";
import { itemBookings, itemHistory, itemWaitlist, settleLapsedOffers, stepsFor, type BookingDto } from "@/server/services/lending";
import { antennaDayLabels, upcomingDayChoices } from "@/server/services/station-kits";
import { requirePageViewer } from "@/server/session";

export const metadata: Metadata = { title: "Gear item" };

const nextActionHeadings: Record<NextAction["kind"], string> = {
  "take-back": "Take it back",
  "hand-out": "Hand it out",
  return: "Return it",
  "co-sign": "Co-sign a newcomer's request",
  collect: "Your booking is approved",
  awaiting: "Your request is waiting",
  request: "Request this item",
  none: "Not available",
};

export default async function GearItemPage({ params }: { params: Promise<{ itemId: string }> }) {
  const { actor } = await requirePageViewer("gear.view");
  const { itemId } = await params;
  await settleLapsedOffers();
  const item = await loadOrNotFound(itemId, (id) => getItem(actor, id));
  const [{ timeZone }, files, bookings, waitlist, history] = await Promise.all([
    getClubSettings(),
    listItemFiles(actor, itemId),
    itemBookings(actor, itemId),
    itemWaitlist(actor, itemId),
    itemHistory(actor, itemId),
  ]);
  const keeper = can(actor, "gear.manage");
  const now = new Date();
  const next = nextActionFor(
    { id: actor.id, managesLoans: can(actor, "loans.manage"), mayRequest: can(actor, "loans.request"), mayCoSign: canCoSignLoan(actor, "") },
    { retired: item.retiredAt !== null, requestNeedsCoSign: loanNeedsCoSign(actor, item.kind) },
    bookings.map((booking) => ({ ...booking, startsAt: new Date(booking.startsAt), endsAt: new Date(booking.endsAt) })),
    now,
  );
  const nextBooking = "bookingId" in next ? bookings.find((booking) => booking.id === next.bookingId) : undefined;
  const [dayChoices, dayLabels] = await Promise.all([next.kind === "request" ? upcomingDayChoices(actor, now) : [], antennaDayLabels(bookings)]);
  const tomorrow = instantToDate(new Date(now.getTime() + 86_400_000), timeZone);
  const shelfCondition: ShelfCondition | undefined = item.condition === "retired" ? undefined : item.condition;
  const photos = files.filter((file) => file.purpose === "photo");
  const manuals = files.filter((file) => file.purpose === "manual");

  const bookingLine = (booking: BookingDto) => (
    <>
      <StateBadge state={booking.state} overdue={booking.overdue} /> <span className="font-bold">{booking.borrowerName}</span> ·{" "}
      {formatRangeInZone(booking.startsAt, booking.endsAt, timeZone)}
      {dayLabels.has(booking.id) && <span> · for {dayLabels.get(booking.id)}</span>}
      {booking.awaitingCoSign && <span className="text-sm text-slate-700"> · waits for a mentor&apos;s co-sign</span>}
    </>
  );

  return (
    <>
      <PageHeader title={`${item.labelCode} · ${item.name}`}>
        {keeper && (
          <>
            <ButtonLink href={`/gear/${item.id}/edit`} variant="secondary">
              Edit
            </ButtonLink>
            <ButtonLink href={`/gear/labels?items=${item.id}`} variant="secondary">
              Print its label
            </ButtonLink>
          </>
        )}
      </PageHeader>
      {item.retiredAt && <Notice tone="info" title="This item is retired.">It stays on record with its history but cannot be booked.</Notice>}

      <Card title={nextActionHeadings[next.kind]}>
        <div data-testid="next-action" data-action={next.kind}>
          {next.kind === "request" && (
            <RequestForm itemId={item.id} timeZone={timeZone} defaultStart={`${tomorrow}T09:00`} defaultEnd={`${tomorrow}T17:00`} needsCoSign={next.needsCoSign} days={dayChoices} />
          )}
          {next.kind === "none" && <p>{next.reason}</p>}
          {nextBooking && (
            <>
              <p>{bookingLine(nextBooking)}</p>
              {next.kind === "collect" && <p className="mt-1">Collect it from a steward when your booking starts.</p>}
              {next.kind === "awaiting" && <p className="mt-1">{next.awaitingCoSign ? "A mentor co-signs it first, then a steward approves it." : "A steward will approve or decline it."}</p>}
              <BookingSteps booking={nextBooking} steps={stepsFor(actor, nextBooking)} isBorrower={nextBooking.borrowerId === actor.id} currentCondition={shelfCondition} />
            </>
          )}
        </div>
      </Card>

      <Card title="About this item">
        <dl className="grid gap-x-6 gap-y-2 sm:grid-cols-[max-content_1fr]">
          <dt className="font-bold">Kind</dt>
          <dd>{gearKindLabels[item.kind]}</dd>
          <dt className="font-bold">Condition</dt>
          <dd>
            <ConditionBadge condition={item.condition} />
          </dd>
          <dt className="font-bold">Kept in</dt>
          <dd>{item.location}</dd>
          {detailSummary(item) && (
            <>
              <dt className="font-bold">Details</dt>
              <dd>{detailSummary(item)}</dd>
            </>
          )}
          {item.kind === "analyser" && (
            <>
              <dt className="font-bold">Battery checked</dt>
              <dd>{item.batteryCheckedOn ?? "not recorded"}</dd>
              <dt className="font-bold">Calibration checked</dt>
              <dd>{item.calibrationCheckedOn ?? "not recorded"}</dd>
            </>
          )}
          <dt className="font-bold">Approval</dt>
          <dd>{approvalRuleLabels[item.approvalRule]}</dd>
          {item.notes && (
            <>
              <dt className="font-bold">Notes</dt>
              <dd className="whitespace-pre-line">{item.notes}</dd>
            </>
          )}
        </dl>
        {item.kind === "mast" && (
          <Notice tone="caution" title="Masts can fall">
            Guy the mast as its maker says, keep its fall zone clear of people, paths and power lines, and never raise it near overhead lines. Local codes and licensed practice prevail.
          </Notice>
        )}
        {item.kind === "power" && (
          <Notice tone="caution" title="Generators and mains power">
            Run generators outdoors, away from tents, with an earth as the maker says; refuel only when cold. Local electrical rules prevail.
          </Notice>
        )}
      </Card>

      <Card title="Photos and manuals">
        {photos.length === 0 && manuals.length === 0 && <p className="text-slate-600">No photos or manuals yet.</p>}
        {photos.length > 0 && (
          <ul className="flex flex-wrap gap-3">
            {photos.map((photo) => (
              <li key={photo.id}>
                <a href={photo.url}>
                  {/* eslint-disable-next-line @next/next/no-img-element -- stored files are served by Guyline's own route */}
                  <img src={photo.url} alt={`Photo of ${item.name}: ${photo.fileName}`} className="h-32 w-auto rounded-lg border border-slate-200 object-cover" />
                </a>
                {keeper && <DeleteButton url={photo.url} verb="Remove" what={photo.fileName} />}
              </li>
            ))}
          </ul>
        )}
        {manuals.length > 0 && (
          <ul className="mt-3 list-disc pl-5">
            {manuals.map((manual) => (
              <li key={manual.id}>
                <a href={manual.url}>{manual.fileName}</a> ({Math.ceil(manual.byteSize / 1024)} KB) {keeper && <DeleteButton url={manual.url} verb="Remove" what={manual.fileName} />}
              </li>
            ))}
          </ul>
        )}
        {keeper && <FileUpload itemId={item.id} />}
      </Card>

      <Card title="Bookings">
        {bookings.length === 0 ? (
          <p className="text-slate-600">Nobody has booked this item.</p>
        ) : (
          <ul className="divide-y divide-slate-200">
            {bookings.map((booking) => (
              <li key={booking.id} className="py-2" data-testid="item-booking">
                <p>{bookingLine(booking)}</p>
                {booking.note && <p className="text-sm text-slate-700">{booking.note}</p>}
                {booking.id !== nextBooking?.id && <BookingSteps booking={booking} steps={stepsFor(actor, booking)} isBorrower={booking.borrowerId === actor.id} currentCondition={shelfCondition} />}
              </li>
            ))}
          </ul>
        )}
      </Card>

      <Card title="Waitlist">
        {waitlist.length === 0 ? (
          <p className="text-slate-600">Nobody is waiting for this item.</p>
        ) : (
          <ol className="list-decimal divide-y divide-slate-200 pl-5">
            {waitlist.map((entry) => (
              <li key={entry.id} className="py-2">
                <span className="font-bold">{entry.userName}</span> wants {formatRangeInZone(entry.startsAt, entry.endsAt, timeZone)}
                {entry.state === "offered" && entry.offerExpiresAt && <> · offered until {formatInZone(entry.offerExpiresAt, timeZone)}</>}
                {entry.userId === actor.id && <WaitlistButtons entryId={entry.id} offered={entry.state === "offered"} />}
              </li>
            ))}
          </ol>
        )}
        <p className="mt-2 text-sm text-slate-600">
          When booked time comes free, the first person whose time fits is offered it and has a day (or until their time starts) to accept. <Link href="/lending">Your offers</Link> also show on the lending desk.
        </p>
      </Card>

      <Card title="History">
        <HistoryList entries={history} timeZone={timeZone} />
      </Card>

      {keeper && !item.retiredAt && (
        <Card title="Retire this item">
          <p className="mb-3 text-slate-700">A retired item keeps its history but can no longer be booked. You can bring it back by editing it.</p>
          <RetireForm itemId={item.id} />
        </Card>
      )}
    </>
  );
}
