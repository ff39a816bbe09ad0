// The station-slot form: every field as the form holds it (strings), read into the slot the
// service takes. Field names match the service's own (planParams.heightM, bands, x, ...), so
// that the engine's problems land beside the right field.
import { z } from "zod";
import { bandsForRegion, type ItuRegion } from "@/lib/antenna/bands";
import { FAMILY_IDS, PLAN_MAX_MHZ, PLAN_MIN_MHZ, type FamilyId } from "@/lib/antenna/plan-schema";
import { FEEDLINE_TYPES, type FeedlineTypeId } from "@/lib/antenna/feedline-types";
import { SLOT_MODES, type SlotMode, type SlotPlanParams } from "@/lib/antenna-days/slot-plan";
import type { SlotInput } from "./antenna-days";

export interface FamilyField {
  name: string;
  label: string;
  hint?: string;
  /** A choice instead of a number. */
  options?: string[];
  /** Left empty, the engine's default applies. */
  optional?: boolean;
  defaultValue: string;
}

export const familyLabels: Record<FamilyId, string> = {
  dipole: "Half-wave dipole",
  "inverted-v": "Inverted-V",
  vertical: "Quarter-wave vertical with radials",
  "end-fed": "End-fed half-wave",
  "off-centre-fed": "Off-centre-fed dipole",
  "fan-dipole": "Fan dipole (one element per band)",
};

/** Each family's own parameters (the engine's plan schema has their ranges and defaults). */
export const familyFields: Record<FamilyId, FamilyField[]> = {
  dipole: [],
  "inverted-v": [{ name: "includedAngleDeg", label: "Angle between the legs (°)", hint: "180° is a flat dipole.", defaultValue: "120" }],
  vertical: [
    { name: "radials", label: "Number of radials", defaultValue: "4" },
    { name: "radialDroopDeg", label: "Radial droop below level (°)", defaultValue: "45" },
  ],
  "end-fed": [
    { name: "unun", label: "Unun", options: ["49:1", "64:1"], defaultValue: "49:1" },
    { name: "farEndHeightM", label: "Far-end height (m)", hint: "Empty: level with the feed point.", optional: true, defaultValue: "" },
    { name: "counterpoiseM", label: "Counterpoise (m)", hint: "Empty: 0.05 λ (common practice).", optional: true, defaultValue: "" },
  ],
  "off-centre-fed": [{ name: "feedPosition", label: "Feed point (fraction of the length from one end)", defaultValue: "0.33" }],
  "fan-dipole": [{ name: "spreadDeg", label: "Extra droop of each shorter element (°)", defaultValue: "15" }],
};

export const familyHeightLabels: Record<FamilyId, string> = {
  dipole: "Height of the wire (m)",
  "inverted-v": "Height of the apex (m)",
  vertical: "Height of the base and radial hub (m)",
  "end-fed": "Height of the feed point (m)",
  "off-centre-fed": "Height of the wire (m)",
  "fan-dipole": "Height of the feed point (m)",
};

const numberText = (message: string) => z.string().trim().min(1, message).refine((value) => Number.isFinite(Number(value)), message);
const optionalNumberText = z.string().trim().refine((value) => value === "" || Number.isFinite(Number(value)), "Enter a number or leave it empty.");

export const slotFormSchema = z
  .object({
    dayId: z.uuid(),
    slotId: z.uuid().or(z.literal("")),
    name: z.string().trim().min(1, "Name the station.").max(60, "Use at most 60 characters."),
    bands: z.array(z.string()).min(1, "Choose at least one band.").max(6, "At most 6 bands."),
    powerW: numberText("Enter the power in watts."),
    mode: z.enum(SLOT_MODES, { message: "Choose a mode." }),
    planParams: z.looseObject({
      family: z.enum(FAMILY_IDS, { message: "Choose an antenna family." }),
      heightM: numberText("Enter the height in metres."),
      wireDiameterMm: numberText("Enter the wire diameter in millimetres."),
      feedlineType: z.enum(FEEDLINE_TYPES.map((type) => type.id) as [FeedlineTypeId, ...FeedlineTypeId[]], { message: "Choose the coax." }),
    }),
    x: numberText("Enter metres east."),
    y: numberText("Enter metres north."),
    azimuthDeg: numberText("Enter a bearing in degrees."),
    tentX: numberText("Enter metres east."),
    tentY: numberText("Enter metres north."),
    feedlineRunOverrideM: optionalNumberText,
  })
  .superRefine((form, context) => {
    for (const field of familyFields[form.planParams.family]) {
      const value = String(form.planParams[field.name] ?? "").trim();
      const valid = field.options ? field.options.includes(value) : (field.optional && value === "") || (value !== "" && Number.isFinite(Number(value)));
      if (!valid) context.addIssue({ code: "custom", path: ["planParams", field.name], message: field.options ? "Choose one." : "Enter a number." });
    }
  })
  .transform((form) => {
    const { family, heightM, wireDiameterMm, feedlineType } = form.planParams;
    const own: Record<string, string | number> = {};
    for (const field of familyFields[family]) {
      const value = String(form.planParams[field.name] ?? "").trim();
      if (value !== "") own[field.name] = field.options ? value : Number(value);
    }
    const slot: SlotInput = {
      name: form.name,
      bands: form.bands,
      powerW: Number(form.powerW),
      mode: form.mode,
      planParams: { family, heightM: Number(heightM), wireDiameterMm: Number(wireDiameterMm), feedlineType, ...own },
      x: Number(form.x),
      y: Number(form.y),
      azimuthDeg: Number(form.azimuthDeg),
      tentX: Number(form.tentX),
      tentY: Number(form.tentY),
      feedlineRunOverrideM: form.feedlineRunOverrideM === "" ? null : Number(form.feedlineRunOverrideM),
    };
    return { dayId: form.dayId, slotId: form.slotId || null, slot };
  });
export type SlotFormValues = z.input<typeof slotFormSchema>;

/** The bands a plan can use in the club's region (160 m to 70 cm). */
export function planBandNames(region: ItuRegion): string[] {
  return bandsForRegion(region)
    .filter((band) => band.lowMHz >= PLAN_MIN_MHZ && band.highMHz <= PLAN_MAX_MHZ)
    .map((band) => band.name);
}

/** Every family's own fields at their defaults, so that switching family shows sensible values. */
const allFamilyDefaults = (): Record<string, string> =>
  Object.fromEntries(FAMILY_IDS.flatMap((family) => familyFields[family].map((field) => [field.name, field.defaultValue])));

const text = (value: unknown) => (value === undefined || value === null ? "" : String(value));

interface SlotForForm {
  id: string;
  name: string;
  bands: string[];
  powerW: number;
  mode: SlotMode;
  planParams: SlotPlanParams;
  x: number;
  y: number;
  azimuthDeg: number;
  tentX: number;
  tentY: number;
  feedlineRunOverrideM: number | null;
}

/** The form's values for an existing slot, or a new one in the middle of the site. */
export function slotFormValues(dayId: string, slot: SlotForForm | null, site: { widthM: number; depthM: number }): SlotFormValues {
  if (!slot) {
    return {
      dayId,
      slotId: "",
      name: "",
      bands: [],
      powerW: "100",
      mode: "ssb",
      planParams: { family: "dipole", heightM: "10", wireDiameterMm: "2", feedlineType: "rg213", ...allFamilyDefaults() },
      x: String(Math.round(site.widthM / 2)),
      y: String(Math.round(site.depthM / 2)),
      azimuthDeg: "0",
      tentX: String(Math.round(site.widthM / 2)),
      tentY: String(Math.max(0, Math.round(site.depthM / 2) - 15)),
      feedlineRunOverrideM: "",
    };
  }
  const params = Object.fromEntries(Object.entries(slot.planParams).map(([key, value]) => [key, text(value)]));
  return {
    dayId,
    slotId: slot.id,
    name: slot.name,
    bands: slot.bands,
    powerW: String(slot.powerW),
    mode: slot.mode,
    planParams: { ...allFamilyDefaults(), ...params, family: slot.planParams.family, feedlineType: slot.planParams.feedlineType, heightM: text(slot.planParams.heightM), wireDiameterMm: text(slot.planParams.wireDiameterMm) },
    x: String(slot.x),
    y: String(slot.y),
    azimuthDeg: String(slot.azimuthDeg),
    tentX: String(slot.tentX),
    tentY: String(slot.tentY),
    feedlineRunOverrideM: text(slot.feedlineRunOverrideM),
  };
}
