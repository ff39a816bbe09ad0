// When an item is free: overlaps, the next free time for a wanted stretch, overdue loans and
// waitlist offers, as pure functions of plain intervals and `now`. Intervals are half-open,
// [start, end), like PostgreSQL's default tstzrange, so a booking ending at 12:00 and one
// starting at 12:00 do not clash.

export interface Interval {
  start: Date;
  end: Date;
}

/** The longest a single booking may run. */
export const MAX_BOOKING_DAYS = 60;
/** How long a waitlist offer stays open, unless the wanted time starts sooner. */
export const OFFER_HOURS = 24;
/** An offer is never shorter than this, so a person has a chance to see it. */
export const MIN_OFFER_MINUTES = 60;
/** Loans due back within this many hours count as "due soon" on the home page. */
export const DUE_SOON_HOURS = 48;

const HOUR = 3_600_000;

export function overlaps(a: Interval, b: Interval): boolean {
  return a.start.getTime() < b.end.getTime() && b.start.getTime() < a.end.getTime();
}

export function isFree(busy: readonly Interval[], wanted: Interval): boolean {
  return !busy.some((interval) => overlaps(interval, wanted));
}

/**
 * The earliest start at or after the wanted start at which a stretch of the same length fits
 * between the busy intervals.
 */
export function nextFreeStart(busy: readonly Interval[], wanted: Interval): Date {
  const length = wanted.end.getTime() - wanted.start.getTime();
  let start = wanted.start.getTime();
  for (;;) {
    const end = start + length;
    const clash = busy.filter((interval) => interval.start.getTime() < end && start < interval.end.getTime());
    if (clash.length === 0) return new Date(start);
    start = Math.max(...clash.map((interval) => interval.end.getTime()));
  }
}

/** Why a wanted range cannot be booked at all (before looking at other bookings), or null. */
export function rangeProblem(wanted: Interval, now: Date): string | null {
  if (!(wanted.end.getTime() > wanted.start.getTime())) return "The end must come after the start.";
  if (wanted.end.getTime() <= now.getTime()) return "That time is already over; choose a time to come.";
  if (wanted.end.getTime() - wanted.start.getTime() > MAX_BOOKING_DAYS * 24 * HOUR) {
    return `A booking can run at most ${MAX_BOOKING_DAYS} days.`;
  }
  return null;
}

export function isOverdue(loan: { state: string; endsAt: Date }, now: Date): boolean {
  return loan.state === "out" && loan.endsAt.getTime() <= now.getTime();
}

export function isDueSoon(loan: { state: string; endsAt: Date }, now: Date): boolean {
  const left = loan.endsAt.getTime() - now.getTime();
  return loan.state === "out" && left > 0 && left <= DUE_SOON_HOURS * HOUR;
}

/** An offer lasts a day, or until the wanted time starts if that is sooner, but at least an hour. */
export function offerExpiry(now: Date, wantedStart: Date): Date {
  const dayLater = now.getTime() + OFFER_HOURS * HOUR;
  const atLeast = now.getTime() + MIN_OFFER_MINUTES * 60_000;
  return new Date(Math.max(Math.min(dayLater, wantedStart.getTime()), atLeast));
}

export interface WaitingEntry extends Interval {
  id: string;
  createdAt: Date;
}

/**
 * Who on the waitlist is offered the item now: in order of joining, each person whose wanted
 * time is free of bookings and of the offers made before them. Entries whose wanted time is
 * over are stale.
 */
export function pickOffers(waiting: readonly WaitingEntry[], busy: readonly Interval[], now: Date): { offer: string[]; stale: string[] } {
  const held: Interval[] = [...busy];
  const offer: string[] = [];
  const stale: string[] = [];
  for (const entry of [...waiting].sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime())) {
    if (entry.end.getTime() <= now.getTime()) {
      stale.push(entry.id);
    } else if (isFree(held, entry)) {
      offer.push(entry.id);
      held.push(entry);
    }
  }
  return { offer, stale };
}
