// The lending desk's booking states and the transitions between them, as a pure state machine.
// Who may take each step is decided by src/server/policy.ts; this module only says which steps
// a booking in a given state allows.

export const bookingStates = ["requested", "approved", "out", "returned", "declined", "cancelled", "lost"] as const;
export type BookingState = (typeof bookingStates)[number];

export const bookingStateLabels: Record<BookingState, string> = {
  requested: "Requested",
  approved: "Approved",
  out: "Out",
  returned: "Returned",
  declined: "Declined",
  cancelled: "Cancelled",
  lost: "Lost",
};

export const bookingActions = ["approve", "decline", "hand-out", "return", "cancel", "co-sign", "mark-lost"] as const;
export type BookingAction = (typeof bookingActions)[number];

export const bookingActionLabels: Record<BookingAction, string> = {
  approve: "Approve",
  decline: "Decline",
  "hand-out": "Hand out",
  return: "Take back",
  cancel: "Cancel",
  "co-sign": "Co-sign",
  "mark-lost": "Mark lost",
};

/** The states in which a booking holds the item's time (the database's exclusion constraint uses the same list). */
export const timeHoldingStates = ["approved", "out"] as const satisfies readonly BookingState[];

export function holdsTime(state: BookingState): boolean {
  return (timeHoldingStates as readonly BookingState[]).includes(state);
}

/** The states a booking can still move on from; the others are final. */
export const openStates = ["requested", "approved", "out", "lost"] as const satisfies readonly BookingState[];

const transitions: Record<BookingAction, { from: readonly BookingState[]; to: BookingState | "same" }> = {
  approve: { from: ["requested"], to: "approved" },
  // A steward may decline an approved booking too (e.g. the item is needed elsewhere); that frees its time.
  decline: { from: ["requested", "approved"], to: "declined" },
  "hand-out": { from: ["approved"], to: "out" },
  // A lost item that turns up is taken back like any other.
  return: { from: ["out", "lost"], to: "returned" },
  cancel: { from: ["requested", "approved"], to: "cancelled" },
  // Co-signing leaves the request a request: a steward still approves it.
  "co-sign": { from: ["requested"], to: "same" },
  "mark-lost": { from: ["out"], to: "lost" },
};

export interface BookingFacts {
  state: BookingState;
  /** A newcomer's analyser request needs a mentor's co-sign before approval. */
  coSignRequired: boolean;
  coSigned: boolean;
}

export type TransitionResult = { ok: true; to: BookingState } | { ok: false; message: string };

export function transition(booking: BookingFacts, action: BookingAction): TransitionResult {
  const rule = transitions[action];
  if (!rule.from.includes(booking.state)) {
    return {
      ok: false,
      message: `A booking that is ${bookingStateLabels[booking.state].toLowerCase()} cannot be ${pastTense[action]}.`,
    };
  }
  if (action === "co-sign") {
    if (!booking.coSignRequired) return { ok: false, message: "This request does not need a co-sign." };
    if (booking.coSigned) return { ok: false, message: "This request is already co-signed." };
  }
  if (action === "approve" && booking.coSignRequired && !booking.coSigned) {
    return { ok: false, message: "A mentor has to co-sign this newcomer's request before a steward can approve it." };
  }
  return { ok: true, to: rule.to === "same" ? booking.state : rule.to };
}

const pastTense: Record<BookingAction, string> = {
  approve: "approved",
  decline: "declined",
  "hand-out": "handed out",
  return: "taken back",
  cancel: "cancelled",
  "co-sign": "co-signed",
  "mark-lost": "marked lost",
};

/** The steps the booking's state allows (before asking who may take them). */
export function allowedActions(booking: BookingFacts): BookingAction[] {
  return bookingActions.filter((action) => transition(booking, action).ok);
}

/** True when the step releases time the booking held, so the waitlist should be offered it. */
export function releasesTime(from: BookingState, to: BookingState): boolean {
  return holdsTime(from) && !holdsTime(to);
}
