/**
 * Station kits: which items on the gear shelf suit a station slot, and in what order to offer
 * them. Pure: the slot's needs and the shelf's items in, the fitting items out, best first.
 *
 * - A coax run must reach from the mast to the tent (at least the slot's feedline run), must have
 *   the characteristic impedance of the line the plan was made for, and should not be far longer
 *   than the run (the rest lies coiled at the tent and only adds loss). The best run loses least
 *   at the station's highest frequency, by the engine's matched-loss fit of its cable type
 *   (reference-data.md §5).
 * - A mast must reach the slot's mast height; a balun or unun must have the ratio the antenna
 *   family is fed through and be rated for the station's power; an analyser must cover the
 *   station's bands.
 */
import { feedlineType, type FeedlineTypeId, type TransformerId } from "@/lib/antenna/feedline-types";
import { matchedLossDb } from "@/lib/antenna/feedline";
import type { GearCondition, GearKind } from "@/lib/gear/kinds";

/** What a station slot needs from the shelf. */
export interface KitNeed {
  /** The feedline run the slot computes (or the coordinator's override), metres. */
  runM: number;
  /** The line type the plan was made for. */
  plannedLine: FeedlineTypeId;
  /** The bottom of the station's lowest band and the top of its highest, MHz. */
  lowMHz: number;
  topMHz: number;
  /** The mast's height in the plan (what must be raised). */
  mastHeightM: number;
  /** The balun or unun the antenna family is fed through. */
  transformer: TransformerId;
  powerW: number;
}

/** An item on the shelf with the details the kit rules read (null where its kind has none). */
export interface KitItem {
  id: string;
  labelCode: string;
  name: string;
  kind: GearKind;
  condition: GearCondition;
  cableType: FeedlineTypeId | null;
  lengthM: number | null;
  heightM: number | null;
  transformerRatio: TransformerId | null;
  powerRatingW: number | null;
  minMhz: number | null;
  maxMhz: number | null;
}

/** The kinds the kit page books for a slot, and what each is for the station. */
export const KIT_KINDS = ["coax", "mast", "balun", "analyser"] as const satisfies readonly GearKind[];
export type KitKind = (typeof KIT_KINDS)[number];
export const isKitKind = (kind: GearKind): kind is KitKind => (KIT_KINDS as readonly GearKind[]).includes(kind);

/**
 * The longest sensible run for a slot, common practice: the run plus half again, and never less
 * than 10 m of spare. Any more is a coil at the tent that adds loss and weight for nothing.
 */
export const SPARE_FRACTION = 0.5;
export const MIN_SPARE_M = 10;
export function longestSensibleRunM(runM: number): number {
  return runM + Math.max(MIN_SPARE_M, SPARE_FRACTION * runM);
}

/** How many of each kind the kit page offers: enough to choose from, few enough to compute at once. */
export const SUGGESTION_LIMITS: Record<KitKind, number> = { coax: 4, mast: 3, balun: 3, analyser: 3 };

const metres = (value: number) => `${Number(value.toFixed(1))} m`;

/** Why the item does not suit the slot, or null when it does. */
export function kitProblem(item: KitItem, need: KitNeed): string | null {
  if (item.condition === "retired") return `${item.labelCode} is retired.`;
  if (item.condition === "needs_repair") return `${item.labelCode} needs repair.`;
  switch (item.kind) {
    case "coax": {
      const planned = feedlineType(need.plannedLine);
      const line = feedlineType(item.cableType!);
      if (line.z0Ohms !== planned.z0Ohms) return `${item.labelCode} is ${line.label} (${line.z0Ohms} Ω); the plan is fed with ${planned.z0Ohms} Ω line.`;
      if (item.lengthM! < need.runM) return `${item.labelCode} is ${metres(item.lengthM!)}, shorter than the slot's feedline run of ${metres(need.runM)}.`;
      const longest = longestSensibleRunM(need.runM);
      if (item.lengthM! > longest) return `${item.labelCode} is ${metres(item.lengthM!)}, far longer than the run of ${metres(need.runM)} (at most ${metres(longest)}).`;
      return null;
    }
    case "mast":
      return item.heightM! < need.mastHeightM ? `${item.labelCode} is ${metres(item.heightM!)}, lower than the plan's mast of ${metres(need.mastHeightM)}.` : null;
    case "balun":
      if (item.transformerRatio !== need.transformer) return `${item.labelCode} is ${item.transformerRatio}; the antenna is fed through ${need.transformer}.`;
      return item.powerRatingW! < need.powerW ? `${item.labelCode} is rated for ${item.powerRatingW} W, less than the station's ${need.powerW} W.` : null;
    case "analyser":
      return item.minMhz! > need.lowMHz || item.maxMhz! < need.topMHz
        ? `${item.labelCode} covers ${item.minMhz}–${item.maxMhz} MHz, not the station's ${need.lowMHz}–${need.topMHz} MHz.`
        : null;
    default:
      return null;
  }
}

/** Matched loss of the run at the station's highest frequency, where coax loses most. */
export function runLossAtTopDb(item: Pick<KitItem, "cableType" | "lengthM">, need: Pick<KitNeed, "topMHz">): number {
  return matchedLossDb(feedlineType(item.cableType!), need.topMHz, item.lengthM!);
}

const byLabel = (a: KitItem, b: KitItem) => a.labelCode.localeCompare(b.labelCode);

/**
 * Best first: coax by the lowest loss, then the shorter run; masts, baluns and analysers that are
 * just big enough first, so the taller masts, stronger baluns and wider analysers stay free for
 * the stations that need them.
 */
const rankings: Record<KitKind, (need: KitNeed) => (a: KitItem, b: KitItem) => number> = {
  coax: (need) => (a, b) => runLossAtTopDb(a, need) - runLossAtTopDb(b, need) || a.lengthM! - b.lengthM! || byLabel(a, b),
  mast: () => (a, b) => a.heightM! - b.heightM! || byLabel(a, b),
  balun: () => (a, b) => a.powerRatingW! - b.powerRatingW! || byLabel(a, b),
  analyser: () => (a, b) => a.maxMhz! - a.minMhz! - (b.maxMhz! - b.minMhz!) || byLabel(a, b),
};

export type KitSuggestions<T extends KitItem = KitItem> = Record<KitKind, T[]>;

/** The items of each kit kind that suit the slot, best first, at most SUGGESTION_LIMITS of each. */
export function suggestKit<T extends KitItem>(items: readonly T[], need: KitNeed): KitSuggestions<T> {
  const suggestions = {} as KitSuggestions<T>;
  for (const kind of KIT_KINDS) {
    suggestions[kind] = items
      .filter((item) => item.kind === kind && kitProblem(item, need) === null)
      .sort(rankings[kind](need))
      .slice(0, SUGGESTION_LIMITS[kind]);
  }
  return suggestions;
}
