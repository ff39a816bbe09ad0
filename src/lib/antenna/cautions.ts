/**
 * The safety cautions every antenna plan carries (product.md, "Cautions the product shows").
 * Common practice throughout: they name the usual precautions and defer to local codes and
 * licensed practice, which always come last. The plan screen, the station sheet and the day
 * page show the same words.
 */
import { END_VOLTAGE_CAUTION } from "./end-voltage";

export const CLOSING_CAUTION = "Local codes and licensed practice prevail.";

export const SAFETY_CAUTIONS = {
  powerLines:
    "Masts near power lines kill. Keep every mast and wire well clear of overhead lines, farther than the mast height plus the longest wire in any direction it could fall, sag or blow; if in doubt, choose another spot.",
  fallZone:
    "Raise masts with a crew of two or more, never in strong wind or with thunder about; nobody stands in a mast's fall zone while it goes up, comes down or takes load, and paths and tents stay out of it.",
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
