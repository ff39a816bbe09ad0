// A message template: its category, whether it can be turned off, and its body as a pure
// function of plain data. renderTemplate adds the greeting, the layout and the footer.
import type { MailCategory } from "../categories";
import { composeMail, type AlwaysSentReason, type MailBody, type MailContent, type MailContext } from "../layout";
import { formatInZone, formatRangeInZone } from "@/lib/time";

export interface MailTemplate<D> {
  category: MailCategory;
  /** Why the message is sent whatever the member's choices; null when the category is their choice. */
  alwaysSent: AlwaysSentReason;
  body(data: D, context: MailContext): MailBody;
}

export function defineTemplate<D>(template: MailTemplate<D>): MailTemplate<D> {
  return template;
}

export function renderTemplate<D>(template: MailTemplate<D>, data: D, context: MailContext): MailContent {
  return composeMail(template.body(data, context), context, template.category, template.alwaysSent);
}

/** "Sat 13 Jun 2026, 09:00–12:30" in the club's time zone, with the zone named. */
export function when(startsAt: string, endsAt: string, context: MailContext): string {
  return `${formatRangeInZone(startsAt, endsAt, context.timeZone)} (${context.timeZone} time)`;
}

export function at(instant: string, context: MailContext, style: "dateTime" | "date" = "dateTime"): string {
  return formatInZone(instant, context.timeZone, style);
}

/** "Ada and Bram", "Ada, Bram and Cleo". */
export function listNames(names: readonly string[]): string {
  if (names.length <= 1) return names[0] ?? "";
  return `${names.slice(0, -1).join(", ")} and ${names.at(-1)}`;
}
