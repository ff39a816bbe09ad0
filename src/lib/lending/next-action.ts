// The next step a person can take with an item, for the item page and the QR label link:
// a steward at the shelf wants "hand out" or "take back", a borrower "return", a mentor
// "co-sign", everyone else "request". Pure: the caller passes what the policy allows.
import type { BookingState } from "./states";

/** How far ahead an approved booking shows up as "hand out" on the item page. */
export const HAND_OUT_LEAD_HOURS = 24;

export interface ItemBookingFacts {
  id: string;
  state: BookingState;
  borrowerId: string;
  startsAt: Date;
  endsAt: Date;
  coSignRequired: boolean;
  coSigned: boolean;
}

export interface ViewerFacts {
  id: string;
  /** May hand out, take back, approve (policy "loans.manage"). */
  managesLoans: boolean;
  /** May request gear at all (policy "loans.request"). */
  mayRequest: boolean;
  /** Confirmed mentor who is not a newcomer (policy canCoSignLoan, apart from the borrower check). */
  mayCoSign: boolean;
}

export type NextAction =
  | { kind: "take-back"; bookingId: string }
  | { kind: "hand-out"; bookingId: string }
  | { kind: "return"; bookingId: string }
  | { kind: "co-sign"; bookingId: string }
  | { kind: "collect"; bookingId: string }
  | { kind: "awaiting"; bookingId: string; awaitingCoSign: boolean }
  | { kind: "request"; needsCoSign: boolean }
  | { kind: "none"; reason: string };

export function nextActionFor(
  viewer: ViewerFacts,
  item: { retired: boolean; requestNeedsCoSign: boolean },
  bookings: readonly ItemBookingFacts[],
  now: Date,
): NextAction {
  const byStart = [...bookings].sort((a, b) => a.startsAt.getTime() - b.startsAt.getTime());
  const out = byStart.find((booking) => booking.state === "out");
  const handOutBy = now.getTime() + HAND_OUT_LEAD_HOURS * 3_600_000;
  const dueForHandOut = byStart.find(
    (booking) => booking.state === "approved" && booking.startsAt.getTime() <= handOutBy && booking.endsAt.getTime() > now.getTime(),
  );

  if (viewer.managesLoans) {
    if (out) return { kind: "take-back", bookingId: out.id };
    if (dueForHandOut) return { kind: "hand-out", bookingId: dueForHandOut.id };
  }

  const mine = byStart.filter((booking) => booking.borrowerId === viewer.id && booking.endsAt.getTime() > now.getTime());
  const myOut = byStart.find((booking) => booking.state === "out" && booking.borrowerId === viewer.id);
  if (myOut) return { kind: "return", bookingId: myOut.id };
  const myApproved = mine.find((booking) => booking.state === "approved");
  if (myApproved) return { kind: "collect", bookingId: myApproved.id };

  if (viewer.mayCoSign) {
    const toCoSign = byStart.find(
      (booking) => booking.state === "requested" && booking.coSignRequired && !booking.coSigned && booking.borrowerId !== viewer.id,
    );
    if (toCoSign) return { kind: "co-sign", bookingId: toCoSign.id };
  }

  const myRequest = mine.find((booking) => booking.state === "requested");
  if (myRequest) return { kind: "awaiting", bookingId: myRequest.id, awaitingCoSign: myRequest.coSignRequired && !myRequest.coSigned };

  if (item.retired) return { kind: "none", reason: "This item is retired and cannot be booked." };
  if (!viewer.mayRequest) return { kind: "none", reason: "Your role cannot borrow gear yet." };
  return { kind: "request", needsCoSign: item.requestNeedsCoSign };
}
