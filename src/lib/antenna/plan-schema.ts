/**
 * The `plan` request, validated with zod. Units: metres, MHz, millimetres for the
 * wire diameter, watts, degrees. docs/antenna-plan.md documents it with an example.
 */
import { z } from "zod";
import { bandAt, bandByName, type ItuRegion } from "./bands";
import { MODE_DUTY, type OperatingMode } from "./exposure";
import { FEEDLINE_TYPES, type FeedlineTypeId } from "./feedline-types";
import { GROUND_CLASS_IDS } from "./ground-classes";

/** Wire plans from 160 m to 70 cm: below 1.8 MHz a half-wave is longer than any field. */
export const PLAN_MIN_MHZ = 1.8;
export const PLAN_MAX_MHZ = 450;

export const FAMILY_IDS = ["dipole", "inverted-v", "vertical", "end-fed", "off-centre-fed", "fan-dipole"] as const;
export type FamilyId = (typeof FAMILY_IDS)[number];

const finite = (what: string) => z.number({ error: `must be a number (${what})` });

/**
 * Object errors: unknown fields named one by one, anything else (a missing or
 * non-object value) as `otherwise`.
 */
function objectError(otherwise: string) {
  return (issue: { code?: string; keys?: string[] }) =>
    issue.code === "unrecognized_keys" && issue.keys
      ? `unknown field${issue.keys.length === 1 ? "" : "s"} ${issue.keys.map((key) => `"${key}"`).join(", ")}`
      : otherwise;
}

const regionSchema = z.union([z.literal(1), z.literal(2), z.literal(3)], {
  error: "must be the ITU Region, 1, 2 or 3",
});

const groundSchema = z.union(
  [
    z.enum([...GROUND_CLASS_IDS, "free-space", "perfect"]),
    z.strictObject({
      conductivitySm: finite("S/m").positive("must be greater than 0").max(10, "must be at most 10 S/m"),
      relativePermittivity: finite("relative permittivity").min(1, "must be at least 1").max(100, "must be at most 100"),
    }),
  ],
  {
    error: `must be one of ${[...GROUND_CLASS_IDS, "free-space", "perfect"].join(", ")}, or { conductivitySm, relativePermittivity }`,
  },
);

const FEEDLINE_IDS = FEEDLINE_TYPES.map((type) => type.id) as [FeedlineTypeId, ...FeedlineTypeId[]];
const MODES = Object.keys(MODE_DUTY) as [OperatingMode, ...OperatingMode[]];

const feedlineSchema = z.strictObject(
  {
    type: z.enum(FEEDLINE_IDS, { error: `must be one of ${FEEDLINE_IDS.join(", ")}` }),
    lengthM: finite("metres").min(0, "must be 0 or more").max(1000, "must be at most 1000 m"),
  },
  { error: objectError("must be { type, lengthM }") },
);

const transmitterSchema = z.strictObject(
  {
    powerW: finite("watts, PEP").positive("must be greater than 0").max(10_000, "must be at most 10000 W"),
    mode: z.enum(MODES, { error: `must be one of ${MODES.join(", ")}` }),
    transmitTimeFraction: finite("0 to 1").gt(0, "must be greater than 0").max(1, "must be at most 1").optional(),
  },
  { error: objectError("must be { powerW, mode }") },
);

const siteFields = {
  region: regionSchema,
  heightM: finite("metres").positive("must be greater than 0").max(300, "must be at most 300 m"),
  wireDiameterMm: finite("millimetres").positive("must be greater than 0").max(100, "must be at most 100 mm"),
  conductor: z.enum(["copper", "aluminium", "perfect"], { error: "must be copper, aluminium or perfect" }).default("copper"),
  ground: groundSchema,
  feedline: feedlineSchema,
  transmitter: transmitterSchema,
};

/** A single-band family names a band, or a centre frequency inside a band. */
const singleBandFields = {
  ...siteFields,
  band: z.string({ error: "must be a band name such as 20m" }).optional(),
  centreMHz: finite("MHz").positive("must be greater than 0").optional(),
};

/** One family's request: a closed object, so a field of another family is named as unknown. */
function planObject<Shape extends z.ZodRawShape>(shape: Shape) {
  return z.strictObject(shape, { error: objectError("must be a JSON object with a family") });
}

const dipoleSchema = planObject({ family: z.literal("dipole"), ...singleBandFields });

const invertedVSchema = planObject({
  family: z.literal("inverted-v"),
  ...singleBandFields,
  includedAngleDeg: finite("degrees")
    .min(60, "must be at least 60° (narrower legs couple too closely)")
    .max(180, "must be at most 180° (180° is a flat dipole)")
    .default(120),
});

const verticalSchema = planObject({
  family: z.literal("vertical"),
  ...singleBandFields,
  radials: finite("count").int("must be a whole number").min(1, "must be at least 1").max(16, "must be at most 16").default(4),
  radialDroopDeg: finite("degrees").min(0, "must be 0° (level) or more").max(80, "must be at most 80°").default(45),
});

const endFedSchema = planObject({
  family: z.literal("end-fed"),
  ...singleBandFields,
  unun: z.enum(["49:1", "64:1"], { error: "must be 49:1 or 64:1" }).default("49:1"),
  farEndHeightM: finite("metres").positive("must be greater than 0").max(300, "must be at most 300 m").optional(),
  counterpoiseM: finite("metres").positive("must be greater than 0").max(50, "must be at most 50 m").optional(),
});

const offCentreFedSchema = planObject({
  family: z.literal("off-centre-fed"),
  ...singleBandFields,
  feedPosition: finite("fraction of the length")
    .min(0.1, "must be at least 0.1")
    .max(0.5, "must be at most 0.5")
    .default(1 / 3),
});

const fanDipoleSchema = planObject({
  family: z.literal("fan-dipole"),
  ...siteFields,
  bands: z
    .array(z.string({ error: "must be a band name such as 20m" }), { error: "must be a list of 2 or 3 band names" })
    .min(2, "must name 2 or 3 bands")
    .max(3, "must name 2 or 3 bands"),
  spreadDeg: finite("degrees").min(5, "must be at least 5°").max(45, "must be at most 45°").default(15),
});

function checkBandChoice(
  request: { region: ItuRegion; band?: string; centreMHz?: number },
  ctx: z.RefinementCtx,
): void {
  if ((request.band === undefined) === (request.centreMHz === undefined)) {
    ctx.addIssue({ code: "custom", path: ["band"], message: "give either band or centreMHz, not both or neither" });
    return;
  }
  if (request.band !== undefined) {
    const band = bandByName(request.band, request.region);
    if (!band) {
      ctx.addIssue({ code: "custom", path: ["band"], message: `"${request.band}" is not an amateur band in Region ${request.region}` });
    } else if (band.lowMHz < PLAN_MIN_MHZ || band.highMHz > PLAN_MAX_MHZ) {
      ctx.addIssue({ code: "custom", path: ["band"], message: `plans cover 160m to 70cm; ${band.name} is outside` });
    }
    return;
  }
  const mhz = request.centreMHz as number;
  if (!(mhz > 0)) return; // already reported by the field's own check
  if (mhz < PLAN_MIN_MHZ || mhz > PLAN_MAX_MHZ) {
    ctx.addIssue({ code: "custom", path: ["centreMHz"], message: `must be between ${PLAN_MIN_MHZ} and ${PLAN_MAX_MHZ} MHz` });
  } else if (!bandAt(mhz, request.region)) {
    ctx.addIssue({ code: "custom", path: ["centreMHz"], message: `${mhz} MHz is not inside an amateur band in Region ${request.region}` });
  }
}

function checkFanBands(request: { region: ItuRegion; bands: string[] }, ctx: z.RefinementCtx): void {
  const seen = new Set<string>();
  request.bands.forEach((name, index) => {
    const band = bandByName(name, request.region);
    if (!band) {
      ctx.addIssue({ code: "custom", path: ["bands", index], message: `"${name}" is not an amateur band in Region ${request.region}` });
    } else if (band.lowMHz < PLAN_MIN_MHZ || band.highMHz > PLAN_MAX_MHZ) {
      ctx.addIssue({ code: "custom", path: ["bands", index], message: `plans cover 160m to 70cm; ${band.name} is outside` });
    } else if (seen.has(band.name)) {
      ctx.addIssue({ code: "custom", path: ["bands", index], message: `${band.name} is named twice` });
    } else {
      seen.add(band.name);
    }
  });
}

export const planRequestSchema = z
  .discriminatedUnion(
    "family",
    [dipoleSchema, invertedVSchema, verticalSchema, endFedSchema, offCentreFedSchema, fanDipoleSchema],
    {
      error: (issue) =>
        typeof issue.input === "object" && issue.input !== null && !Array.isArray(issue.input)
          ? `must be one of ${FAMILY_IDS.join(", ")}`
          : "must be a JSON object with a family",
    },
  )
  .superRefine((request, ctx) => {
    if (request.family === "fan-dipole") checkFanBands(request, ctx);
    else checkBandChoice(request, ctx);
  });

/** The request as sent (defaults optional). */
export type PlanRequestInput = z.input<typeof planRequestSchema>;
/** The request after validation, defaults filled in. */
export type PlanRequest = z.output<typeof planRequestSchema>;
export type SingleBandPlanRequest = Exclude<PlanRequest, { family: "fan-dipole" }>;
export type FanDipolePlanRequest = Extract<PlanRequest, { family: "fan-dipole" }>;
