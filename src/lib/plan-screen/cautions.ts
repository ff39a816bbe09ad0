// The cautions the plan screen and the station sheet show. Their words live with the engine,
// which puts them in every plan; this module adds the plan screen's own order.
import { SAFETY_CAUTIONS } from "@/lib/antenna/cautions";

export { CLOSING_CAUTION, SAFETY_CAUTIONS } from "@/lib/antenna/cautions";

/** The plan screen's safety block: the hazards of one antenna, then the closing line. */
export const PLAN_SCREEN_CAUTIONS = [SAFETY_CAUTIONS.powerLines, SAFETY_CAUTIONS.exposure, SAFETY_CAUTIONS.endVoltage];

/** Every caution with its heading: the station sheet's and the antenna day's safety list. */
export const LABELLED_SAFETY_CAUTIONS = [
  { label: "Power lines", text: SAFETY_CAUTIONS.powerLines },
  { label: "Fall zone", text: SAFETY_CAUTIONS.fallZone },
  { label: "RF exposure", text: SAFETY_CAUTIONS.exposure },
  { label: "End voltage", text: SAFETY_CAUTIONS.endVoltage },
  { label: "Guying", text: SAFETY_CAUTIONS.guying },
  { label: "Generators", text: SAFETY_CAUTIONS.generators },
  { label: "Lightning", text: SAFETY_CAUTIONS.lightning },
] as const;

/** Before cutting or adding wire after a sweep: the antenna comes down and goes back up. */
export const TRIM_CAUTIONS = [SAFETY_CAUTIONS.endVoltage, SAFETY_CAUTIONS.fallZone, SAFETY_CAUTIONS.guying];
