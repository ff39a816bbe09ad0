// Antenna days and shifts. A cancelled antenna day and a removed shift are always sent: people
// travel to the site.
import type { MailBlock } from "../layout";
import { defineTemplate, when } from "./define";

export interface AntennaDayData {
  name: string;
  startsAt: string;
  endsAt: string;
  siteName: string;
  meetingPoint: string | null;
  /** /antenna-days/<id> */
  path: string;
}

const fieldCautions: MailBlock = {
  kind: "caution",
  title: "Safety on the field",
  items: [
    "Masts near power lines kill: masts and wires go only where the site plan puts them, well clear of any overhead line.",
    "The ends of wire antennas carry a high RF voltage: keep clear of them while a station transmits.",
    "Follow the coordinator's briefing on site; local codes and licensed practice prevail.",
  ],
};

function dayFacts(data: AntennaDayData, context: Parameters<typeof when>[2]): MailBlock {
  return {
    kind: "facts",
    rows: [["When", when(data.startsAt, data.endsAt, context)], ["Where", data.siteName], ...(data.meetingPoint ? [["Meeting point", data.meetingPoint] as const] : [])],
  };
}

export const antennaDayPublished = defineTemplate<AntennaDayData & { summary: string | null }>({
  category: "antenna-days",
  alwaysSent: null,
  body: (data, context) => ({
    subject: `New antenna day: ${data.name}`,
    heading: `${data.name} is on the calendar`,
    blocks: [
      { kind: "paragraph", text: `${context.clubName} has published a new antenna day. Sign up for a shift, book the gear you need, or just come along.` },
      dayFacts(data, context),
      ...(data.summary ? [{ kind: "paragraph", text: data.summary } as const] : []),
      { kind: "action", label: "See the antenna day", path: data.path },
      fieldCautions,
    ],
  }),
});

export const antennaDayChanged = defineTemplate<AntennaDayData & { changes: string[] }>({
  category: "antenna-days",
  alwaysSent: null,
  body: (data, context) => ({
    subject: `Changed: ${data.name}`,
    heading: `${data.name} has changed`,
    blocks: [
      { kind: "list", title: "What changed", items: data.changes },
      dayFacts(data, context),
      { kind: "action", label: "See the antenna day", path: data.path },
    ],
  }),
});

export const antennaDayCancelled = defineTemplate<AntennaDayData & { reason: string | null }>({
  category: "antenna-days",
  alwaysSent: "a cancelled antenna day concerns everyone who might travel to the site.",
  body: (data, context) => ({
    subject: `Cancelled: ${data.name}`,
    heading: `${data.name} is cancelled`,
    blocks: [
      { kind: "paragraph", text: "Do not travel to the site for this antenna day: it will not take place." },
      dayFacts(data, context),
      ...(data.reason ? [{ kind: "paragraph", text: `The coordinator's note: ${data.reason}` } as const] : []),
      { kind: "paragraph", text: "Shifts for the day are cancelled with it. If you booked gear for the day, cancel the booking on the lending desk so that others can use the item." },
      { kind: "action", label: "See the club's antenna days", path: "/antenna-days" },
    ],
  }),
});

export interface ShiftReminderData {
  dayName: string;
  stationName: string;
  bands: string[];
  startsAt: string;
  endsAt: string;
  siteName: string;
  /** /antenna-days/<id> */
  path: string;
}

export const shiftReminder = defineTemplate<ShiftReminderData>({
  category: "shifts",
  alwaysSent: null,
  body: (data, context) => ({
    subject: `Tomorrow: your shift at ${data.stationName}`,
    heading: `Your shift tomorrow at ${data.stationName}`,
    blocks: [
      { kind: "paragraph", text: `A reminder of your shift at ${data.dayName}.` },
      {
        kind: "facts",
        rows: [
          ["When", when(data.startsAt, data.endsAt, context)],
          ["Station", data.stationName],
          ...(data.bands.length > 0 ? [["Bands", data.bands.join(", ")] as const] : []),
          ["Where", data.siteName],
        ],
      },
      { kind: "action", label: "See the station and the site plan", path: data.path },
      fieldCautions,
    ],
  }),
});

export const shiftRemoved = defineTemplate<ShiftReminderData>({
  category: "shifts",
  alwaysSent: "a shift taken off your plans changes whether you travel to the site.",
  body: (data, context) => ({
    subject: `Shift removed: ${data.stationName}, ${data.dayName}`,
    heading: `Your shift at ${data.stationName} is removed`,
    blocks: [
      { kind: "paragraph", text: `A coordinator removed your shift at ${data.dayName}. You are no longer down to operate it.` },
      {
        kind: "facts",
        rows: [
          ["When", when(data.startsAt, data.endsAt, context)],
          ["Station", data.stationName],
          ["Where", data.siteName],
        ],
      },
      { kind: "paragraph", text: "Other shifts of the day may still need operators." },
      { kind: "action", label: "See the antenna day", path: data.path },
    ],
  }),
});
