// The cautions the plan screen and the station sheet show. Their words live with the engine,
// which puts them in every plan; this module adds the plan screen's own order.
import { SAFETY_CAUTIONS } from "@/lib/antenna/cautions";

export { CLOSING_CAUTION, SAFETY_CAUTIONS } from "@/lib/antenna/cautions";

/** The plan screen's safety block: the hazards of one antenna, then the closing line. */
export const PLAN_SCREEN_CAUTIONS = [SAFETY_CAUTIONS.powerLines, SAFETY_CAUTIONS.exposure, SAFETY_CAUTIONS.endVoltage];
