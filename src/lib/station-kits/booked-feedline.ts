/**
 * The coax run booked as a station slot's feedline: from then on the slot's plan is computed with
 * that actual run (its cable type and length) instead of the run the slot computes.
 */
import { feedlineType, type FeedlineTypeId } from "@/lib/antenna/feedline-types";
import { METRES_PER_FOOT, type Units } from "@/lib/plan-screen/format";

export interface BookedFeedline {
  bookingId: string;
  itemId: string;
  labelCode: string;
  name: string;
  cableType: FeedlineTypeId;
  lengthM: number;
}

/** A run's length as its label says it: whole metres stay whole ("25 m"), feet to the foot. */
export function formatRunLength(metres: number, units: Units): string {
  return units === "imperial" ? `${Math.round(metres / METRES_PER_FOOT)} ft` : `${Number(metres.toFixed(1))} m`;
}

/** "CX-13 RG-213 run, 35 m, RG-213, 35 m": the item, then the type and length the plan uses. */
export function bookedFeedlineText(feedline: Pick<BookedFeedline, "labelCode" | "name" | "cableType" | "lengthM">, units: Units): string {
  return `${feedline.labelCode} ${feedline.name}, ${feedlineType(feedline.cableType).label}, ${formatRunLength(feedline.lengthM, units)}`;
}
