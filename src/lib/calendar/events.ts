// Each kind of Guyline event as a calendar event, from plain data. Feed sources
// (src/server/calendar/feed-sources.ts, and the build-session service) load the rows and call these.
import type { CalendarEvent } from "./ics";

/** UIDs name the kind and the row's id; ids are UUIDs, so the UID is unique everywhere. */
export const eventUid = (kind: "build-session" | "antenna-day" | "shift" | "loan", id: string) => `${kind}-${id}@guyline`;

export interface BuildSessionEventData {
  id: string;
  title: string;
  startsAt: Date;
  endsAt: Date;
  place: string;
  mentorNames: string[];
  cancelled: boolean;
  sequence: number;
  updatedAt: Date;
}

export function buildSessionEvent(session: BuildSessionEventData, appUrl: string): CalendarEvent {
  const url = `${appUrl}/build-sessions/${session.id}`;
  const mentors = session.mentorNames.length > 0 ? `Mentors: ${session.mentorNames.join(", ")}.\n` : "";
  return {
    uid: eventUid("build-session", session.id),
    sequence: session.sequence,
    startsAt: session.startsAt,
    endsAt: session.endsAt,
    summary: session.cancelled ? `Cancelled: ${session.title}` : session.title,
    description: `Build session. ${mentors}Materials, cut sheet and safety notes: ${url}`,
    location: session.place,
    url,
    cancelled: session.cancelled,
    updatedAt: session.updatedAt,
  };
}

export interface AntennaDayEventData {
  id: string;
  name: string;
  startsAt: Date;
  endsAt: Date;
  siteName: string;
  summary: string | null;
  cancelled: boolean;
  sequence: number;
  updatedAt: Date;
}

export function antennaDayEvent(day: AntennaDayEventData, appUrl: string): CalendarEvent {
  const url = `${appUrl}/antenna-days/${day.id}`;
  return {
    uid: eventUid("antenna-day", day.id),
    sequence: day.sequence,
    startsAt: day.startsAt,
    endsAt: day.endsAt,
    summary: day.cancelled ? `Cancelled: ${day.name}` : day.name,
    description: `${day.summary ? `${day.summary}\n` : ""}Antenna day. Stations, shifts and the site plan: ${url}\nMasts near power lines kill: keep to the site plan. Local codes and licensed practice prevail.`,
    location: day.siteName,
    url,
    cancelled: day.cancelled,
    updatedAt: day.updatedAt,
  };
}

export interface ShiftEventData {
  id: string;
  dayId: string;
  dayName: string;
  slotId: string;
  stationName: string;
  bands: string[];
  startsAt: Date;
  endsAt: Date;
  siteName: string;
  /** A shift is off when its day is cancelled. */
  cancelled: boolean;
  /** The shift's own sequence plus its day's: each rises on every change, so the sum does too. */
  sequence: number;
  updatedAt: Date;
}

export function shiftEvent(shift: ShiftEventData, appUrl: string): CalendarEvent {
  const url = `${appUrl}/antenna-days/${shift.dayId}#slot-${shift.slotId}`;
  const title = `Shift: ${shift.stationName} (${shift.dayName})`;
  return {
    uid: eventUid("shift", shift.id),
    sequence: shift.sequence,
    startsAt: shift.startsAt,
    endsAt: shift.endsAt,
    summary: shift.cancelled ? `Cancelled: ${title}` : title,
    description: `Operating shift at ${shift.stationName}${shift.bands.length > 0 ? ` on ${shift.bands.join(", ")}` : ""}. The station and the site plan: ${url}\nThe ends of wire antennas carry a high RF voltage: keep clear of them while the station transmits.`,
    location: shift.siteName,
    url,
    cancelled: shift.cancelled,
    updatedAt: shift.updatedAt,
  };
}

/**
 * A loan's due date is an instant; a calendar event needs a span (RFC 5545 §3.8.2.2: DTEND after
 * DTSTART), so the event is the half hour that ends at the due time: time to bring it back.
 */
export const LOAN_RETURN_MINUTES = 30;

export interface LoanDueEventData {
  bookingId: string;
  itemLabelCode: string;
  itemName: string;
  dueAt: Date;
  /** The due date no longer stands: the loan was cancelled or the item is back. */
  cancelled: boolean;
  sequence: number;
  updatedAt: Date;
  location: string;
}

export function loanDueEvent(loan: LoanDueEventData, appUrl: string): CalendarEvent {
  const url = `${appUrl}/lending#booking-${loan.bookingId}`;
  const title = `Due back: ${loan.itemLabelCode} ${loan.itemName}`;
  return {
    uid: eventUid("loan", loan.bookingId),
    sequence: loan.sequence,
    startsAt: new Date(loan.dueAt.getTime() - LOAN_RETURN_MINUTES * 60_000),
    endsAt: loan.dueAt,
    summary: loan.cancelled ? `No longer due: ${loan.itemLabelCode} ${loan.itemName}` : title,
    description: `Bring the item back to the gear steward by the end of this slot, clean and dry. Your loans: ${url}`,
    location: loan.location,
    url,
    cancelled: loan.cancelled,
    updatedAt: loan.updatedAt,
  };
}
