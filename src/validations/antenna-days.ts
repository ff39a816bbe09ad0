// Shared zod schemas for antenna days, sites, station slots and shifts: forms, actions and
// route handlers parse with these. Times are wall-clock times in the club's time zone.
import { z } from "zod";
import { GROUND_CLASS_IDS } from "@/lib/antenna/ground-classes";
import { DAY_STATUSES } from "@/lib/antenna-days/status";
import { SLOT_MODES } from "@/lib/antenna-days/slot-plan";
import { HAZARD_KINDS, hazardHasHeight, hazardPointCounts, type Hazard } from "@/lib/site-plan/hazards";

/** "2027-05-15T09:00", as a datetime-local input gives it. */
export const wallTimeField = z
  .string()
  .trim()
  .regex(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/, "Enter a date and a time.");

const text = (max: number) => z.string().trim().max(max, `Use at most ${max} characters.`);
const required = (max: number, message: string) => text(max).min(1, message);
const number = (message: string) => z.coerce.number({ error: message }).refine(Number.isFinite, message);
const endsAfterStart = { path: ["endsAtLocal"], message: "The end must come after the start." };

// ---- antenna days ----

const dayFields = {
  title: required(120, "Give the day a title."),
  siteId: z.uuid("Choose a site."),
  startsAtLocal: wallTimeField,
  endsAtLocal: wallTimeField,
  meetingPoint: text(300).default(""),
  description: text(5000).default(""),
  safetyLeadId: z.uuid("Choose a safety lead."),
};

export const daySchema = z.object(dayFields).refine((day) => day.endsAtLocal > day.startsAtLocal, endsAfterStart);
export type DayInput = z.infer<typeof daySchema>;
/** The edit form: the day's fields and its id. */
export const dayEditSchema = z.object({ ...dayFields, dayId: z.uuid() }).refine((day) => day.endsAtLocal > day.startsAtLocal, endsAfterStart);

/** A cancellation's note to members, in the e-mail that tells them. */
export const cancelReasonField = text(500)
  .transform((value) => value || undefined)
  .optional();

/** A partial change; `status` moves the day along its life (publish, done, cancel); `cancelReason` goes with a cancellation. */
export const dayPatchSchema = z
  .object({
    ...z.object(dayFields).partial().shape,
    status: z.enum(DAY_STATUSES, { message: "Unknown status." }).optional(),
    cancelReason: cancelReasonField,
  })
  .refine((day) => !day.startsAtLocal || !day.endsAtLocal || day.endsAtLocal > day.startsAtLocal, endsAfterStart)
  .refine((day) => !day.cancelReason || day.status === "cancelled", { path: ["cancelReason"], message: "A note goes only with cancelling the day." });
export type DayPatch = z.infer<typeof dayPatchSchema>;

const copyFields = { title: required(120, "Give the new day a title."), startsAtLocal: wallTimeField, endsAtLocal: wallTimeField };
export const copyDaySchema = z.object(copyFields).refine((day) => day.endsAtLocal > day.startsAtLocal, endsAfterStart);
export const copyDayFormSchema = z.object({ ...copyFields, sourceId: z.uuid() }).refine((day) => day.endsAtLocal > day.startsAtLocal, endsAfterStart);

export const calendarRangeSchema = z
  .object({
    from: z.union([z.iso.datetime({ offset: true }), z.iso.date()], { error: "must be an ISO date or date-time" }),
    to: z.union([z.iso.datetime({ offset: true }), z.iso.date()], { error: "must be an ISO date or date-time" }),
  })
  .refine((range) => new Date(range.to) > new Date(range.from), { path: ["to"], message: "must come after from" })
  .refine((range) => new Date(range.to).getTime() - new Date(range.from).getTime() <= 400 * 24 * 3600 * 1000, { path: ["to"], message: "ask for at most 400 days at once" });

// ---- sites ----

const coordinate = z.number({ error: "Enter a number of metres." }).refine((value) => Math.abs(value) <= 10_000, "Keep coordinates within 10 km.");
const pointSchema = z.tuple([coordinate, coordinate]);

const hazardSchema = z
  .object({
    kind: z.enum(HAZARD_KINDS, { message: "Choose a kind of hazard." }),
    label: required(80, "Name the hazard."),
    points: z.array(pointSchema),
    heightM: z.number({ error: "Enter a height in metres." }).positive("The height must be more than 0 m.").max(500, "At most 500 m.").optional(),
  })
  .superRefine((hazard, context) => {
    const { min, max } = hazardPointCounts[hazard.kind];
    if (hazard.points.length < min || hazard.points.length > max) {
      context.addIssue({ code: "custom", path: ["points"], message: min === max ? "Give exactly one point." : `Give ${min} to ${max} points.` });
    }
    if (hazardHasHeight(hazard.kind) && hazard.heightM === undefined) {
      context.addIssue({ code: "custom", path: ["heightM"], message: "Give its height in metres." });
    }
  })
  .transform((hazard) => {
    const { heightM, ...rest } = hazard;
    return (hazardHasHeight(hazard.kind) ? { ...rest, heightM } : rest) as Hazard;
  });

const siteFields = {
  name: required(120, "Name the site."),
  widthM: number("Enter the width in metres.").positive("The width must be more than 0 m.").max(5000, "At most 5000 m."),
  depthM: number("Enter the depth in metres.").positive("The depth must be more than 0 m.").max(5000, "At most 5000 m."),
  groundClass: z.enum([...GROUND_CLASS_IDS, "custom"], { message: "Choose a ground class." }),
  groundConductivitySm: z.number({ error: "Enter σ in S/m." }).positive("σ must be more than 0.").max(10, "At most 10 S/m.").nullable().default(null),
  groundRelativePermittivity: z.number({ error: "Enter εr." }).min(1, "εr is at least 1.").max(100, "At most 100.").nullable().default(null),
  notes: text(5000).default(""),
  hazards: z.array(hazardSchema).max(100, "At most 100 hazards.").default([]),
};

function customGround(site: { groundClass: string; groundConductivitySm: number | null; groundRelativePermittivity: number | null }, context: z.RefinementCtx) {
  if (site.groundClass !== "custom") return;
  if (site.groundConductivitySm === null) context.addIssue({ code: "custom", path: ["groundConductivitySm"], message: "A custom ground needs σ in S/m." });
  if (site.groundRelativePermittivity === null) context.addIssue({ code: "custom", path: ["groundRelativePermittivity"], message: "A custom ground needs εr." });
}

export const siteSchema = z.object(siteFields).superRefine(customGround);
export type SiteInput = z.infer<typeof siteSchema>;

/**
 * The site form (`siteId` empty for a new site): hazard points typed as "x,y; x,y" text, read into the same shape the API
 * takes. Empty height fields mean "no height".
 */
export const parsePointsText = (value: string): [number, number][] =>
  value
    .split(/[;\n]/)
    .map((pair) => pair.trim())
    .filter(Boolean)
    .map((pair) => pair.split(/[\s,]+/).map(Number) as [number, number]);

const hazardFormRow = z
  .object({
    kind: z.enum(HAZARD_KINDS, { message: "Choose a kind of hazard." }),
    label: z.string(),
    pointsText: z.string().refine(
      (value) => parsePointsText(value).every((pair) => pair.length === 2 && pair.every(Number.isFinite)),
      "Write points as x,y pairs in metres, separated by semicolons: 10,0; 10,80",
    ),
    heightM: z.string().trim(),
  })
  .transform((row) => ({ kind: row.kind, label: row.label, points: parsePointsText(row.pointsText), ...(row.heightM ? { heightM: Number(row.heightM) } : {}) }))
  .pipe(hazardSchema);

export const siteFormSchema = z
  .object({
    siteId: z.uuid().or(z.literal("")),
    ...siteFields,
    groundConductivitySm: z.string().trim().transform((value) => (value === "" ? null : Number(value))).pipe(siteFields.groundConductivitySm.unwrap()),
    groundRelativePermittivity: z.string().trim().transform((value) => (value === "" ? null : Number(value))).pipe(siteFields.groundRelativePermittivity.unwrap()),
    hazards: z.array(hazardFormRow).max(100, "At most 100 hazards."),
  })
  .superRefine(customGround);

// ---- station slots ----

const metresOnPlan = number("Enter metres.").refine((value) => Math.abs(value) <= 10_000, "Keep within 10 km.");

/** The plan's own parameters; the engine's own schema checks them in full when the slot is saved. */
export const planParamsSchema = z.looseObject({ family: z.string({ error: "Choose an antenna family." }) });

const slotFields = {
  name: required(60, "Name the station."),
  bands: z.array(z.string().trim().min(1)).min(1, "Choose at least one band.").max(6, "At most 6 bands."),
  powerW: number("Enter the power in watts.").positive("The power must be more than 0 W.").max(10_000, "At most 10000 W."),
  mode: z.enum(SLOT_MODES, { message: "Choose a mode." }),
  planParams: planParamsSchema,
  x: metresOnPlan,
  y: metresOnPlan,
  azimuthDeg: number("Enter a bearing in degrees.").min(0, "0° to 359°.").lt(360, "0° to 359°.").default(0),
  tentX: metresOnPlan,
  tentY: metresOnPlan,
  feedlineRunOverrideM: number("Enter metres.").positive("The run must be more than 0 m.").max(1000, "At most 1000 m.").nullable().default(null),
};

export const slotSchema = z.object(slotFields);
export type SlotInput = z.infer<typeof slotSchema>;
export const slotPatchSchema = z.object(slotFields).partial();
export type SlotPatch = z.infer<typeof slotPatchSchema>;

// ---- shifts ----

const shiftFields = {
  startsAtLocal: wallTimeField,
  endsAtLocal: wallTimeField,
  capacity: z.coerce.number({ error: "Enter how many people." }).int("A whole number of people.").min(1, "At least 1 person.").max(50, "At most 50 people."),
};
export const shiftSchema = z.object(shiftFields).refine((shift) => shift.endsAtLocal > shift.startsAtLocal, endsAfterStart);
/** The add-a-shift form on a slot. */
export const shiftFormSchema = z.object({ ...shiftFields, slotId: z.uuid() }).refine((shift) => shift.endsAtLocal > shift.startsAtLocal, endsAfterStart);
export type ShiftInput = z.infer<typeof shiftSchema>;
