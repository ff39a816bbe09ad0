// Every message Guyline sends, by name. enqueueMail (src/server/mail/outbox.ts) takes a name
// and that template's data; wiring a new trigger is one call.
import type { MailTemplate } from "./define";
import { invitation, signInHelp } from "./account";
import { antennaDayCancelled, antennaDayChanged, antennaDayPublished, shiftReminder, shiftRemoved } from "./antenna-days";
import {
  buildSessionCancelled,
  buildSessionChanged,
  buildSessionConfirmed,
  buildSessionPromoted,
  buildSessionReminder,
  buildSessionWaitlisted,
} from "./build-sessions";
import { bookingApproved, bookingDeclined, itemDueTomorrow, itemOverdue, returnReceipt, waitlistOffer } from "./lending";

export const mailTemplates = {
  invitation,
  signInHelp,
  antennaDayPublished,
  antennaDayChanged,
  antennaDayCancelled,
  shiftReminder,
  shiftRemoved,
  buildSessionConfirmed,
  buildSessionWaitlisted,
  buildSessionPromoted,
  buildSessionReminder,
  buildSessionChanged,
  buildSessionCancelled,
  bookingApproved,
  bookingDeclined,
  waitlistOffer,
  itemDueTomorrow,
  itemOverdue,
  returnReceipt,
};

export type TemplateName = keyof typeof mailTemplates;
export type TemplateData<N extends TemplateName> = (typeof mailTemplates)[N] extends MailTemplate<infer D> ? D : never;

export { renderTemplate } from "./define";
