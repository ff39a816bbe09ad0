// Each kind of Guyline event as a calendar event, from plain data. Feed sources
// (src/server/calendar/feed-sources.ts) load the rows and call these.
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
