// The gear shelf's vocabulary: kinds of item, their condition, and the kind-specific choices.
// Plain constants shared by the schema, the validations, the import and the pages.
import { FEEDLINE_TYPES, TRANSFORMERS, type FeedlineTypeId, type TransformerId } from "@/lib/antenna/feedline-types";

export const gearKinds = ["analyser", "coax", "mast", "balun", "tuner", "power", "radio", "tools", "other"] as const;
export type GearKind = (typeof gearKinds)[number];

export const gearKindLabels: Record<GearKind, string> = {
  analyser: "Antenna analyser",
  coax: "Coax run",
  mast: "Mast and guy kit",
  balun: "Balun or unun",
  tuner: "Tuner",
  power: "Power supply or generator",
  radio: "Radio",
  tools: "Tool kit",
  other: "Other",
};

export const gearConditions = ["good", "worn", "needs_repair", "retired"] as const;
export type GearCondition = (typeof gearConditions)[number];
/** The conditions an item can be in while it is on the shelf (retiring is its own step). */
export const shelfConditions = ["good", "worn", "needs_repair"] as const satisfies readonly GearCondition[];
export type ShelfCondition = (typeof shelfConditions)[number];

export const gearConditionLabels: Record<GearCondition, string> = {
  good: "Good",
  worn: "Worn",
  needs_repair: "Needs repair",
  retired: "Retired",
};

/** Connector families on a coax run's ends; "bare" is a run ending in bare wire or lugs. */
export const coaxConnectors = ["pl259", "n", "bnc", "sma", "f", "bare"] as const;
export type CoaxConnector = (typeof coaxConnectors)[number];
export const coaxConnectorLabels: Record<CoaxConnector, string> = {
  pl259: "PL-259",
  n: "N",
  bnc: "BNC",
  sma: "SMA",
  f: "F",
  bare: "Bare ends",
};

/** The cable types of the engine's feedline table, so a run's loss can be computed. */
export const cableTypeIds = FEEDLINE_TYPES.map((type) => type.id) as [FeedlineTypeId, ...FeedlineTypeId[]];
export const cableTypeLabels = Object.fromEntries(FEEDLINE_TYPES.map((type) => [type.id, type.label])) as Record<FeedlineTypeId, string>;

export const transformerStyles = ["balun", "unun"] as const;
export const transformerRatios = Object.keys(TRANSFORMERS) as [TransformerId, ...TransformerId[]];

/**
 * How a request for an item is approved. "automatic": a request for a free time is approved at
 * once (first come, first served, like the paper book); "steward": a steward approves each one.
 */
export const approvalRules = ["automatic", "steward"] as const;
export type ApprovalRule = (typeof approvalRules)[number];
export const approvalRuleLabels: Record<ApprovalRule, string> = {
  automatic: "Approved at once when free",
  steward: "A steward approves each request",
};

/** Scarce or delicate gear goes through a steward by default; the rest is first come, first served. */
export function defaultApprovalRule(kind: GearKind): ApprovalRule {
  return kind === "analyser" || kind === "radio" || kind === "power" ? "steward" : "automatic";
}
