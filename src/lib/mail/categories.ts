// What kinds of e-mail Guyline sends. Members choose which optional categories they get;
// account messages (an invitation, sign-in help) answer a request and are always sent.

export const optionalMailCategories = ["antenna-days", "shifts", "build-sessions", "lending"] as const;
export type OptionalMailCategory = (typeof optionalMailCategories)[number];

export const mailCategories = ["account", ...optionalMailCategories] as const;
export type MailCategory = (typeof mailCategories)[number];

export const mailCategoryLabels: Record<MailCategory, string> = {
  account: "Your account (invitations and sign-in help)",
  "antenna-days": "Antenna days: published, changed or cancelled",
  shifts: "Shift reminders the day before",
  "build-sessions": "Build sessions: your place, the waitlist and reminders",
  lending: "Lending desk: bookings, due dates and receipts",
};

/** Short names for the unsubscribe page and the message footer: "e-mails about …". */
export const mailCategoryTopics: Record<MailCategory, string> = {
  account: "your account",
  "antenna-days": "antenna days",
  shifts: "your shifts",
  "build-sessions": "build sessions",
  lending: "the lending desk",
};

/** What goes out whatever a member chooses; each such template says why in its `alwaysSent`. */
export const alwaysSentSummary =
  "Always sent, whatever you choose: invitations and sign-in help, the news that an antenna day or a build session you signed up for is cancelled, and a shift a coordinator removed from your plans.";

export function isOptionalCategory(value: string): value is OptionalMailCategory {
  return (optionalMailCategories as readonly string[]).includes(value);
}
