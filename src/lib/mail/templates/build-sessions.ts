// Build sessions: a place, the waitlist, the reminder, changes and cancellation.
import type { MailBlock, MailContext } from "../layout";
import { defineTemplate, listNames, when } from "./define";

export interface BuildSessionData {
  title: string;
  startsAt: string;
  endsAt: string;
  place: string;
  mentorNames: string[];
  /** /build-sessions/<id> */
  path: string;
}

export interface BuildSessionKitData extends BuildSessionData {
  /** What to bring or borrow, one line each. */
  bring: string[];
}

function sessionFacts(data: BuildSessionData, context: MailContext): MailBlock {
  return {
    kind: "facts",
    rows: [
      ["When", when(data.startsAt, data.endsAt, context)],
      ["Where", data.place],
      ...(data.mentorNames.length > 0 ? [["Mentors", listNames(data.mentorNames)] as const] : []),
    ],
  };
}

const buildCautions: MailBlock = {
  kind: "caution",
  title: "Before you come",
  items: [
    "Read the safety notes on the session page: soldering, cutting wire and the RF voltage at the wire ends when testing.",
    "Your mentor leads; local codes and licensed practice prevail.",
  ],
};

function kitBlocks(data: BuildSessionKitData): MailBlock[] {
  return [
    ...(data.bring.length > 0 ? [{ kind: "list", title: "Bring or borrow", items: data.bring } as const] : []),
    { kind: "paragraph", text: "Gear you can borrow from the club (an analyser, a coax run, a balun) is on the lending desk: request it early." },
  ];
}

export const buildSessionConfirmed = defineTemplate<BuildSessionKitData>({
  category: "build-sessions",
  alwaysSent: null,
  body: (data, context) => ({
    subject: `Your place: ${data.title}`,
    heading: `You have a place at ${data.title}`,
    blocks: [
      sessionFacts(data, context),
      ...kitBlocks(data),
      { kind: "action", label: "See the session, its cut sheet and materials", path: data.path },
      { kind: "paragraph", text: "The attached calendar file adds the session to your calendar. Can no longer come? Cancel on the session page, so the next person in line gets your place." },
      buildCautions,
    ],
  }),
});

export const buildSessionWaitlisted = defineTemplate<BuildSessionData & { position: number }>({
  category: "build-sessions",
  alwaysSent: null,
  body: (data, context) => ({
    subject: `On the waitlist: ${data.title}`,
    heading: `You are on the waitlist for ${data.title}`,
    blocks: [
      {
        kind: "paragraph",
        text: `The session is full. You are number ${data.position} in line; when a place frees up, the first in line gets it at once and hears from Guyline by e-mail.`,
      },
      sessionFacts(data, context),
      { kind: "action", label: "See the session", path: data.path },
    ],
  }),
});

export const buildSessionPromoted = defineTemplate<BuildSessionKitData>({
  category: "build-sessions",
  alwaysSent: null,
  body: (data, context) => ({
    subject: `A place freed up: ${data.title}`,
    heading: `Good news: you now have a place at ${data.title}`,
    blocks: [
      { kind: "paragraph", text: "Someone cancelled and you were first on the waitlist, so the place is yours." },
      sessionFacts(data, context),
      ...kitBlocks(data),
      { kind: "action", label: "See the session", path: data.path },
      { kind: "paragraph", text: "The attached calendar file adds the session to your calendar. Can no longer come? Cancel on the session page so the next person gets the place." },
      buildCautions,
    ],
  }),
});

export const buildSessionReminder = defineTemplate<BuildSessionKitData>({
  category: "build-sessions",
  alwaysSent: null,
  body: (data, context) => ({
    subject: `Tomorrow: ${data.title}`,
    heading: `${data.title} is tomorrow`,
    blocks: [sessionFacts(data, context), ...kitBlocks(data), { kind: "action", label: "See the session", path: data.path }, buildCautions],
  }),
});

export const buildSessionChanged = defineTemplate<BuildSessionData & { changes: string[] }>({
  category: "build-sessions",
  alwaysSent: null,
  body: (data, context) => ({
    subject: `Changed: ${data.title}`,
    heading: `${data.title} has changed`,
    blocks: [
      { kind: "list", title: "What changed", items: data.changes },
      sessionFacts(data, context),
      { kind: "action", label: "See the session", path: data.path },
      { kind: "paragraph", text: "The attached calendar file updates the session in your calendar." },
    ],
  }),
});

export const buildSessionCancelled = defineTemplate<BuildSessionData & { reason: string | null }>({
  category: "build-sessions",
  alwaysSent: "a cancelled session concerns everyone who might travel to it.",
  body: (data, context) => ({
    subject: `Cancelled: ${data.title}`,
    heading: `${data.title} is cancelled`,
    blocks: [
      { kind: "paragraph", text: "Do not travel for this build session: it will not take place." },
      sessionFacts(data, context),
      ...(data.reason ? [{ kind: "paragraph", text: `The coordinator's note: ${data.reason}` } as const] : []),
      { kind: "action", label: "Find another build session", path: "/build-sessions" },
    ],
  }),
});
