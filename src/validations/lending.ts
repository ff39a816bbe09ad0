// zod schemas of the lending desk: requests, the steps of a booking, the waitlist and the loans table.
import { z } from "zod";
import { shelfConditions, gearKinds } from "@/lib/gear/kinds";
import { bookingStates } from "@/lib/lending/states";
import { timeInputPattern } from "@/lib/lending/time-input";

const timeInput = (label: string) =>
  z.string().trim().regex(timeInputPattern, `Enter the ${label} as a date and time, like 2026-06-13T09:00.`);

export const note = z.preprocess(
  (value) => (typeof value === "string" ? value.trim() : value) || undefined,
  z.string().max(1000, "Use at most 1000 characters.").optional(),
);

export const bookingRequestSchema = z.object({
  itemId: z.uuid("Choose an item."),
  /** Wall-clock times in the club's time zone, or instants with an offset. */
  startsAt: timeInput("start"),
  endsAt: timeInput("end"),
  note,
  antennaDayId: z.uuid().optional(),
  stationSlotId: z.uuid().optional(),
});
export type BookingRequestInput = z.output<typeof bookingRequestSchema>;

const reason = z.string().trim().min(3, "Give a short reason.").max(1000, "Use at most 1000 characters.");

export const bookingStepSchema = z.discriminatedUnion("action", [
  z.object({ action: z.literal("approve"), note }),
  z.object({ action: z.literal("decline"), reason }),
  z.object({
    action: z.literal("hand-out"),
    condition: z.enum(shelfConditions, "Record the item's condition."),
    note,
    /** Who handed it out, when it was not the person recording it; a steward or coordinator. */
    handedOutBy: z.uuid().optional(),
  }),
  z.object({
    action: z.literal("return"),
    condition: z.enum(shelfConditions, "Record the item's condition."),
    damageNotes: note,
    /** A photo uploaded for this booking first (POST /api/gear/:id/files with purpose "return"). */
    photoFileId: z.uuid().optional(),
  }),
  z.object({ action: z.literal("cancel"), note }),
  z.object({ action: z.literal("co-sign"), note }),
  z.object({ action: z.literal("mark-lost"), note: reason }),
]);
export type BookingStepInput = z.output<typeof bookingStepSchema>;

export const waitlistJoinSchema = z.object({
  itemId: z.uuid("Choose an item."),
  startsAt: timeInput("start"),
  endsAt: timeInput("end"),
});

export const waitlistStepSchema = z.object({ action: z.enum(["accept", "withdraw"]) });

export const bookingSortFields = ["startsAt", "endsAt", "state", "item", "borrower", "createdAt"] as const;

export const bookingListQuerySchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(20),
  sort: z.enum(bookingSortFields).default("startsAt"),
  dir: z.enum(["asc", "desc"]).default("desc"),
  state: z.enum(bookingStates).optional(),
  kind: z.enum(gearKinds).optional(),
  itemId: z.uuid().optional(),
  borrowerId: z.uuid().optional(),
  overdue: z.enum(["true", "false"]).transform((value) => value === "true").optional(),
  format: z.enum(["json", "csv"]).default("json"),
});
export type BookingListQuery = z.output<typeof bookingListQuerySchema>;
