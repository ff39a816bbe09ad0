// Account messages answer a request (an invitation, sign-in help) and are always sent.
import { at, defineTemplate } from "./define";

export interface InvitationData {
  inviterName: string;
  /** The role's label, e.g. "Member". */
  roleLabel: string;
  isMentor: boolean;
  /** /invite/<token> */
  acceptPath: string;
  expiresAt: string;
}

export const invitation = defineTemplate<InvitationData>({
  category: "account",
  alwaysSent: "a coordinator invited you, and the link is the only way in.",
  body: (data, context) => ({
    subject: `You are invited to ${context.clubName} on Guyline`,
    heading: `${data.inviterName} invites you to ${context.clubName}`,
    blocks: [
      {
        kind: "paragraph",
        text: `Guyline is where ${context.clubName} plans its antenna days, lends its gear and runs build sessions. You are invited as ${data.roleLabel}${data.isMentor ? " and mentor" : ""}.`,
      },
      { kind: "action", label: "Accept the invitation", path: data.acceptPath },
      { kind: "paragraph", text: `The link works once, until ${at(data.expiresAt, context)}. If you did not expect this, ignore the message: nothing happens without you.` },
    ],
  }),
});

export interface SignInHelpData {
  /** /reset-password/<token> */
  resetPath: string;
  expiresAt: string;
}

export const signInHelp = defineTemplate<SignInHelpData>({
  category: "account",
  alwaysSent: "someone asked for a new password for your account.",
  body: (data, context) => ({
    subject: "Choose a new Guyline password",
    heading: "Choose a new password",
    blocks: [
      { kind: "paragraph", text: "Someone, probably you, asked to choose a new password for your Guyline account." },
      { kind: "action", label: "Choose a new password", path: data.resetPath },
      {
        kind: "paragraph",
        text: `The link works once, until ${at(data.expiresAt, context)}. If you did not ask, ignore this message: your password stays as it is.`,
      },
    ],
  }),
});
