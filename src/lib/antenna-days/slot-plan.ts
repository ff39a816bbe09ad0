/**
 * A station slot's antenna plan. The slot stores only the plan's own parameters (family,
 * height, wire, family settings, coax type); the rest of the engine's plan request comes
 * from the slot (bands, power, mode, feedline run) and its site (ground), so that moving a
 * slot or changing the site's ground changes the plan with it.
 */
import { bandByName, type ItuRegion } from "@/lib/antenna/bands";
import type { OperatingMode } from "@/lib/antenna/exposure";
import type { FeedlineTypeId } from "@/lib/antenna/feedline-types";
import type { GroundChoice, GroundClassId } from "@/lib/antenna/ground-classes";
import type { PlanRequest, PlanRequestInput } from "@/lib/antenna/plan-schema";
import { distance, type Point } from "@/lib/site-plan/geometry";

/** Modes a station operates in (the engine's modes without the tune-up carrier). */
export const SLOT_MODES = ["ssb", "cw", "fm", "digital", "am"] as const satisfies readonly OperatingMode[];
export type SlotMode = (typeof SLOT_MODES)[number];

/** Request keys the slot and its site own; everything else is the plan's own parameters. */
const SLOT_OWNED_KEYS = ["region", "ground", "transmitter", "band", "centreMHz", "bands", "feedline"] as const;
type SlotOwnedKey = (typeof SLOT_OWNED_KEYS)[number];
type DistributiveOmit<T, K extends PropertyKey> = T extends unknown ? Omit<T, K> : never;

/** The plan's own parameters as sent (the engine's defaults may be left out). */
export type SlotPlanParamsInput = DistributiveOmit<PlanRequestInput, SlotOwnedKey> & { feedlineType: FeedlineTypeId };
/** The plan's own parameters as stored: validated, the engine's defaults filled in. */
export type SlotPlanParams = DistributiveOmit<PlanRequest, SlotOwnedKey> & { feedlineType: FeedlineTypeId };

/** The plan's own parameters of a full plan request (from the plan screen or the plan library). */
export function slotPlanParamsOf(request: PlanRequest): SlotPlanParams;
export function slotPlanParamsOf(request: PlanRequestInput): SlotPlanParamsInput;
export function slotPlanParamsOf(request: PlanRequest | PlanRequestInput): SlotPlanParams | SlotPlanParamsInput {
  const own: Record<string, unknown> = { ...request, feedlineType: request.feedline.type };
  for (const key of SLOT_OWNED_KEYS) delete own[key];
  return own as unknown as SlotPlanParams;
}

/**
 * Feedline slack, common practice: 2 m for a drip loop under the feed point and a service
 * loop at the tent, plus 10 % of the ground run for routing around guys, pegs and paths.
 */
export const FEEDLINE_SLACK_FIXED_M = 2;
export const FEEDLINE_SLACK_FRACTION = 0.1;

export interface FeedlineRun {
  /** Straight-line distance from the mast to the operating tent. */
  groundM: number;
  /** Up the mast to the feed point. */
  mastM: number;
  slackM: number;
  /** ground + mast + slack. */
  computedM: number;
  /** The coordinator's own figure, when given. */
  overrideM: number | null;
  /** The length the plan uses: the override if given, else the computed run. */
  lengthM: number;
}

export function feedlineRun(input: { position: Point; tent: Point; feedHeightM: number; overrideM: number | null }): FeedlineRun {
  const groundM = distance(input.position, input.tent);
  const slackM = FEEDLINE_SLACK_FIXED_M + FEEDLINE_SLACK_FRACTION * groundM;
  const computedM = groundM + input.feedHeightM + slackM;
  return { groundM, mastM: input.feedHeightM, slackM, computedM, overrideM: input.overrideM, lengthM: input.overrideM ?? computedM };
}

export interface SlotForPlan {
  bands: readonly string[];
  powerW: number;
  mode: SlotMode;
  planParams: SlotPlanParamsInput;
  position: Point;
  tent: Point;
  feedlineRunOverrideM: number | null;
}

export interface SiteGround {
  groundClass: GroundClassId | "custom";
  groundConductivitySm: number | null;
  groundRelativePermittivity: number | null;
}

export function groundChoiceOf(site: SiteGround): GroundChoice {
  if (site.groundClass !== "custom") return site.groundClass;
  return { conductivitySm: site.groundConductivitySm ?? NaN, relativePermittivity: site.groundRelativePermittivity ?? NaN };
}

/**
 * The band a single-band antenna is cut for: the slot's lowest band. An end-fed half-wave or
 * an off-centre-fed dipole works its higher bands as harmonics of that one, and a dipole on a
 * tuner covers higher bands more easily than lower ones. Unknown names stay as given, so
 * the engine's validation names them.
 */
export function designBand(bands: readonly string[], region: ItuRegion): string | undefined {
  const known = bands.flatMap((name) => bandByName(name, region) ?? []);
  if (known.length < bands.length) return bands.find((name) => !bandByName(name, region));
  return known.sort((a, b) => a.lowMHz - b.lowMHz)[0]?.name;
}

/** The engine's full plan request for the slot. Validate it with the engine's planRequestSchema. */
export function planRequestForSlot(slot: SlotForPlan, site: SiteGround, region: ItuRegion): PlanRequestInput {
  const { feedlineType, ...own } = slot.planParams;
  const run = feedlineRun({ position: slot.position, tent: slot.tent, feedHeightM: own.heightM, overrideM: slot.feedlineRunOverrideM });
  const bandChoice = own.family === "fan-dipole" ? { bands: [...slot.bands] } : { band: designBand(slot.bands, region) };
  return {
    ...own,
    ...bandChoice,
    region,
    ground: groundChoiceOf(site),
    feedline: { type: feedlineType, lengthM: run.lengthM },
    transmitter: { powerW: slot.powerW, mode: slot.mode },
  } as PlanRequestInput;
}

/** Where a problem with the plan request belongs on the slot (for answers that name the field). */
export function slotFieldOfPlanPath(path: string): string {
  if (path === "band" || path === "centreMHz" || path.startsWith("bands")) return "bands";
  if (path === "transmitter.powerW") return "powerW";
  if (path === "transmitter.mode") return "mode";
  if (path === "feedline.lengthM") return "feedlineRunOverrideM";
  if (path === "feedline.type" || path === "feedline") return "planParams.feedlineType";
  if (path.startsWith("ground")) return "site.ground";
  return path ? `planParams.${path}` : "planParams";
}
