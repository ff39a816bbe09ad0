// The club calendar: entries from several sources, each kind with its own colour from
// Guyline's palette. To add a kind, add one source to `calendarSources`: a kind, a legend
// label, a colour and a function that returns the person's entries in a time range.
import { and, asc, eq, gt, inArray, lt } from "drizzle-orm";
import { LOAN_RETURN_MINUTES } from "@/lib/calendar/events";
import { db } from "@/server/db";
import { buildSessions, gearBookings, gearItems } from "@/server/db/schema";
import { can, type Actor } from "@/server/policy";
import { listDays } from "@/server/services/antenna-days";
import { listMyShifts } from "@/server/services/shifts";

export interface CalendarEntry {
  /** Unique across sources ("<kind>:<id>"); FullCalendar wants string ids. */
  id: string;
  kind: string;
  title: string;
  start: string;
  end: string;
  allDay: boolean;
  /** The page that opens the entry. */
  href: string;
}

export interface CalendarKind {
  kind: string;
  label: string;
  /** Background colour; white text on it meets WCAG AA contrast. */
  colour: string;
}

interface CalendarSource extends CalendarKind {
  entries(actor: Actor, range: { from: Date; to: Date }): Promise<Omit<CalendarEntry, "kind">[]>;
}

export const calendarSources: CalendarSource[] = [
  {
    kind: "antenna-day",
    label: "Antenna day",
    colour: "#7f4a1f", // copper-700
    async entries(actor, range) {
      const days = await listDays(actor, range);
      return days.map((day) => ({
        id: `antenna-day:${day.id}`,
        title: day.status === "published" || day.status === "done" ? day.title : `${day.title} (${day.status})`,
        start: day.startsAt,
        end: day.endsAt,
        allDay: false,
        href: `/antenna-days/${day.id}`,
      }));
    },
  },
  {
    kind: "my-shift",
    label: "My shift",
    colour: "#334155", // slate-700
    async entries(actor, range) {
      const mine = await listMyShifts(actor, range);
      return mine.map((shift) => ({
        id: `my-shift:${shift.shiftId}`,
        title: `Shift: ${shift.slotName} (${shift.dayTitle})`,
        start: shift.startsAt,
        end: shift.endsAt,
        allDay: false,
        href: `/antenna-days/${shift.dayId}#slot-${shift.slotId}`,
      }));
    },
  },
  {
    kind: "build-session",
    label: "Build session",
    colour: "#9c5d26", // copper-600
    async entries(actor, range) {
      if (!can(actor, "buildSessions.view")) return [];
      const rows = await db()
        .select({ id: buildSessions.id, title: buildSessions.title, startsAt: buildSessions.startsAt, endsAt: buildSessions.endsAt, status: buildSessions.status })
        .from(buildSessions)
        .where(and(lt(buildSessions.startsAt, range.to), gt(buildSessions.endsAt, range.from)))
        .orderBy(asc(buildSessions.startsAt));
      return rows.map((session) => ({
        id: `build-session:${session.id}`,
        title: session.status === "cancelled" ? `Build session: ${session.title} (cancelled)` : `Build session: ${session.title}`,
        start: session.startsAt.toISOString(),
        end: session.endsAt.toISOString(),
        allDay: false,
        href: `/build-sessions/${session.id}`,
      }));
    },
  },
  {
    kind: "loan-due",
    label: "My loan due back",
    colour: "#64748b", // slate-500
    async entries(actor, range) {
      if (!can(actor, "loans.request")) return [];
      // The half hour before the due time, as in the calendar feed.
      const rows = await db()
        .select({ id: gearBookings.id, endsAt: gearBookings.endsAt, labelCode: gearItems.labelCode, name: gearItems.name })
        .from(gearBookings)
        .innerJoin(gearItems, eq(gearItems.id, gearBookings.itemId))
        .where(and(eq(gearBookings.borrowerId, actor.id), inArray(gearBookings.state, ["approved", "out", "lost"]), gt(gearBookings.endsAt, range.from), lt(gearBookings.endsAt, range.to)))
        .orderBy(asc(gearBookings.endsAt));
      return rows.map((loan) => ({
        id: `loan-due:${loan.id}`,
        title: `Due back: ${loan.labelCode} ${loan.name}`,
        start: new Date(loan.endsAt.getTime() - LOAN_RETURN_MINUTES * 60_000).toISOString(),
        end: loan.endsAt.toISOString(),
        allDay: false,
        href: `/lending#booking-${loan.id}`,
      }));
    },
  },
];

export function calendarKinds(): CalendarKind[] {
  return calendarSources.map(({ kind, label, colour }) => ({ kind, label, colour }));
}

export async function calendarEntries(actor: Actor, range: { from: Date; to: Date }): Promise<CalendarEntry[]> {
  const lists = await Promise.all(calendarSources.map(async (source) => (await source.entries(actor, range)).map((entry) => ({ ...entry, kind: source.kind }))));
  return lists.flat().sort((a, b) => a.start.localeCompare(b.start));
}
