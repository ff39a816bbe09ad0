// Feed sources of antenna days, a person's shifts and their loans' due dates: each loads its
// rows and turns them into calendar events with the builders in src/lib/calendar/events.ts.
// Events from a month back stay in the feed, so a change or a cancellation of a recent one
// still reaches subscribed calendars.
import { and, eq, gt, inArray, isNotNull, or } from "drizzle-orm";
import { appUrl } from "@/env";
import { descriptionExcerpt } from "@/lib/antenna-days/day-notices";
import { antennaDayEvent, loanDueEvent, shiftEvent } from "@/lib/calendar/events";
import type { CalendarEvent } from "@/lib/calendar/ics";
import { db } from "@/server/db";
import { antennaDays, gearBookings, gearItems, shifts, shiftSignups, sites, stationSlots } from "@/server/db/schema";
import type { FeedSource } from "./feeds";

const FEED_PAST_DAYS = 30;
const feedSince = () => new Date(Date.now() - FEED_PAST_DAYS * 24 * 3600 * 1000);
/** The club's antenna days once published (done and cancelled ones too, so calendars follow). */
export const antennaDayFeed: FeedSource = {
  name: "antenna days",
  async eventsFor(): Promise<CalendarEvent[]> {
    const rows = await db()
      .select({ day: antennaDays, siteName: sites.name })
      .from(antennaDays)
      .innerJoin(sites, eq(sites.id, antennaDays.siteId))
      .where(and(inArray(antennaDays.status, ["published", "done", "cancelled"]), gt(antennaDays.endsAt, feedSince())));
    return rows.map(({ day, siteName }) =>
      antennaDayEvent(
        {
          id: day.id,
          name: day.title,
          startsAt: day.startsAt,
          endsAt: day.endsAt,
          siteName,
          summary: descriptionExcerpt(day.description),
          cancelled: day.status === "cancelled",
          sequence: day.sequence,
          updatedAt: day.updatedAt,
        },
        appUrl(),
      ),
    );
  },
};

/** The person's shifts; a shift of a cancelled day is cancelled with it. */
export const shiftFeed: FeedSource = {
  name: "shifts",
  async eventsFor(userId: string): Promise<CalendarEvent[]> {
    const rows = await db()
      .select({ shift: shifts, slot: stationSlots, day: antennaDays, siteName: sites.name })
      .from(shiftSignups)
      .innerJoin(shifts, eq(shifts.id, shiftSignups.shiftId))
      .innerJoin(stationSlots, eq(stationSlots.id, shifts.slotId))
      .innerJoin(antennaDays, eq(antennaDays.id, stationSlots.dayId))
      .innerJoin(sites, eq(sites.id, antennaDays.siteId))
      .where(and(eq(shiftSignups.personId, userId), inArray(antennaDays.status, ["published", "done", "cancelled"]), gt(shifts.endsAt, feedSince())));
    return rows.map(({ shift, slot, day, siteName }) =>
      shiftEvent(
        {
          id: shift.id,
          dayId: day.id,
          dayName: day.title,
          slotId: slot.id,
          stationName: slot.name,
          bands: slot.bands,
          startsAt: shift.startsAt,
          endsAt: shift.endsAt,
          siteName,
          cancelled: day.status === "cancelled",
          sequence: shift.sequence + day.sequence,
          updatedAt: shift.updatedAt > day.updatedAt ? shift.updatedAt : day.updatedAt,
        },
        appUrl(),
      ),
    );
  },
};

/**
 * The due dates of the person's loans: approved, out or lost. A loan that was approved and then
 * cancelled, or is back, turns CANCELLED, so a calendar drops the reminder it showed.
 */
export const loanFeed: FeedSource = {
  name: "loans",
  async eventsFor(userId: string): Promise<CalendarEvent[]> {
    const rows = await db()
      .select({ booking: gearBookings, itemLabelCode: gearItems.labelCode, itemName: gearItems.name, location: gearItems.location })
      .from(gearBookings)
      .innerJoin(gearItems, eq(gearItems.id, gearBookings.itemId))
      .where(
        and(
          eq(gearBookings.borrowerId, userId),
          gt(gearBookings.endsAt, feedSince()),
          or(inArray(gearBookings.state, ["approved", "out", "lost", "returned"]), and(eq(gearBookings.state, "cancelled"), isNotNull(gearBookings.decidedAt))),
        ),
      );
    return rows.map(({ booking, itemLabelCode, itemName, location }) =>
      loanDueEvent(
        {
          bookingId: booking.id,
          itemLabelCode,
          itemName,
          dueAt: booking.endsAt,
          cancelled: booking.state === "cancelled" || booking.state === "returned",
          sequence: booking.sequence,
          updatedAt: booking.updatedAt,
          location,
        },
        appUrl(),
      ),
    );
  },
};
