/**
 * The antenna plan form: one flat set of values holding every family's own settings, so that
 * switching family in the form keeps what was typed for the others, and the engine's plan
 * request built from it with only the keys its family takes (the engine's schema refuses
 * unknown keys). Pure: used by the plan screen in the browser and by its unit tests.
 */
import type { OperatingMode } from "@/lib/antenna/exposure";
import type { FeedlineTypeId } from "@/lib/antenna/feedline-types";
import type { GroundClassId } from "@/lib/antenna/ground-classes";
import type { FamilyId, PlanRequestInput } from "@/lib/antenna/plan-schema";

/** Grounds the form offers: the named classes and the two ideal cases (a site can also have a custom σ/εr). */
export type FormGround = GroundClassId | "free-space" | "perfect" | "custom";

export interface PlanFormValues {
  family: FamilyId;
  /** Single-band families. */
  band: string;
  /** The fan dipole's 2 or 3 bands. */
  bands: string[];
  heightM: number;
  wireDiameterMm: number;
  conductor: "copper" | "aluminium" | "perfect";
  includedAngleDeg: number;
  radials: number;
  radialDroopDeg: number;
  unun: "49:1" | "64:1";
  /** Optional: the engine's default when empty. */
  farEndHeightM?: number;
  counterpoiseM?: number;
  feedPosition: number;
  spreadDeg: number;
  ground: FormGround;
  /** Only for the custom ground. */
  customGround: { conductivitySm: number; relativePermittivity: number };
  feedline: { type: FeedlineTypeId; lengthM: number };
  transmitter: { powerW: number; mode: OperatingMode; transmitTimeFraction?: number };
}

/** Each family's own fields beyond the shared ones (plan-schema.ts). */
export const FAMILY_FIELDS = {
  dipole: [],
  "inverted-v": ["includedAngleDeg"],
  vertical: ["radials", "radialDroopDeg"],
  "end-fed": ["unun", "farEndHeightM", "counterpoiseM"],
  "off-centre-fed": ["feedPosition"],
  "fan-dipole": ["spreadDeg"],
} as const satisfies Record<FamilyId, readonly (keyof PlanFormValues)[]>;

/**
 * Starting values: a 20 m dipole at 10 m over average ground on 20 m of RG-213 at 100 W SSB,
 * and the engine's own defaults for the other families' settings (plan-schema.ts).
 */
export const DEFAULT_FORM_VALUES: PlanFormValues = {
  family: "dipole",
  band: "20m",
  bands: ["40m", "20m"],
  heightM: 10,
  wireDiameterMm: 2,
  conductor: "copper",
  includedAngleDeg: 120,
  radials: 4,
  radialDroopDeg: 45,
  unun: "49:1",
  farEndHeightM: undefined,
  counterpoiseM: undefined,
  feedPosition: 1 / 3,
  spreadDeg: 15,
  ground: "average",
  customGround: { conductivitySm: 0.005, relativePermittivity: 13 },
  feedline: { type: "rg213", lengthM: 20 },
  transmitter: { powerW: 100, mode: "ssb" },
};

/** The engine's plan request for the form's values, in the club's ITU Region. */
export function requestOfForm(values: PlanFormValues, region: 1 | 2 | 3): PlanRequestInput {
  const own: Record<string, unknown> = {};
  for (const field of FAMILY_FIELDS[values.family]) {
    if (values[field] !== undefined) own[field] = values[field];
  }
  return {
    family: values.family,
    ...(values.family === "fan-dipole" ? { bands: values.bands } : { band: values.band }),
    region,
    heightM: values.heightM,
    wireDiameterMm: values.wireDiameterMm,
    conductor: values.conductor,
    ground: values.ground === "custom" ? values.customGround : values.ground,
    feedline: values.feedline,
    transmitter: values.transmitter,
    ...own,
  } as PlanRequestInput;
}

/** Form values showing a plan request (a library plan, a slot's plan); the rest keeps `base`. */
export function formOfRequest(request: PlanRequestInput, base: PlanFormValues = DEFAULT_FORM_VALUES): PlanFormValues {
  const values: PlanFormValues = { ...base, family: request.family };
  if (request.family === "fan-dipole") values.bands = [...request.bands];
  else if (request.band !== undefined) values.band = request.band;
  values.heightM = request.heightM;
  values.wireDiameterMm = request.wireDiameterMm;
  if (request.conductor !== undefined) values.conductor = request.conductor;
  if (typeof request.ground === "object") {
    values.ground = "custom";
    values.customGround = { ...request.ground };
  } else {
    values.ground = request.ground;
  }
  values.feedline = { ...request.feedline };
  values.transmitter = { ...request.transmitter };
  const own = request as Record<string, unknown>;
  const target = values as unknown as Record<string, unknown>;
  for (const field of FAMILY_FIELDS[request.family]) {
    if (own[field] !== undefined) target[field] = own[field];
  }
  return values;
}
