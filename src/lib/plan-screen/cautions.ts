/**
 * The cautions the plan screen and the station sheet show (product.md, "Cautions the
 * product shows"). Common practice throughout: they name the usual precautions and defer to
 * local codes and licensed practice, which always come last.
 */
import { END_VOLTAGE_CAUTION } from "@/lib/antenna/end-voltage";

export const CLOSING_CAUTION = "Local codes and licensed practice prevail.";

export const SAFETY_CAUTIONS = {
  powerLines:
    "Masts near power lines kill. Keep every mast and wire well clear of overhead lines, farther than the mast height plus the longest wire in any direction it could fall, sag or blow; if in doubt, choose another spot.",
  fallZone: "Nobody stands in a mast's fall zone while it goes up, comes down or takes load; keep paths and tents out of it.",
  exposure:
    "Keep people outside the RF-exposure distances while transmitting. They are screening figures from the published limits, not measurements, and local rules prevail.",
  endVoltage: END_VOLTAGE_CAUTION,
  guying:
    "Guy every mast at three or more points at its guy radius; check stakes, knots and tension before raising and after gusts, and flag the guy lines so nobody walks into them.",
  generators:
    "Run generators in the open, away from tents and downwind; refuel only when they are stopped and cool, and keep fuel away from the operating position.",
  lightning:
    "At the first thunder stop operating, disconnect the feedlines outside the tent, lower masts if that is safe, and get everyone to shelter away from masts and wires.",
} as const;

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
