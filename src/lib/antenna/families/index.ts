/** The antenna families a plan can use, and the one place that turns a request into a family model. */
import type { FamilyId, PlanRequest } from "../plan-schema";
import { dipoleModel } from "./dipole";
import { endFedModel } from "./end-fed";
import { fanDipoleModel } from "./fan-dipole";
import type { ElementTarget, FamilyModel, Site } from "./family";
import { invertedVModel } from "./inverted-v";
import { offCentreFedModel } from "./off-centre-fed";
import { verticalModel } from "./vertical";

export interface FamilyInfo {
  id: FamilyId;
  label: string;
  /** What the family's own parameters mean, for forms and documentation. */
  /** The family's own request fields (defaults live in plan-schema.ts). */
  parameters: { name: string; meaning: string }[];
  heightMeaning: string;
}

export const FAMILIES: readonly FamilyInfo[] = [
  {
    id: "dipole",
    label: "Half-wave dipole (flat-top, centre-fed, 1:1 balun)",
    parameters: [],
    heightMeaning: "height of the wire",
  },
  {
    id: "inverted-v",
    label: "Inverted-V (fed at the apex, 1:1 balun)",
    parameters: [{ name: "includedAngleDeg", meaning: "angle between the two legs (180° is flat)" }],
    heightMeaning: "height of the apex",
  },
  {
    id: "vertical",
    label: "Quarter-wave vertical with elevated radials",
    parameters: [
      { name: "radials", meaning: "number of radials, spread evenly" },
      { name: "radialDroopDeg", meaning: "radial droop below level" },
    ],
    heightMeaning: "height of the base (the feed point and radial hub)",
  },
  {
    id: "end-fed",
    label: "End-fed half-wave (49:1 or 64:1 unun, short counterpoise)",
    parameters: [
      { name: "unun", meaning: "unun ratio, 49:1 or 64:1" },
      { name: "farEndHeightM", meaning: "height of the far end (default: level with the feed point)" },
      { name: "counterpoiseM", meaning: "counterpoise length (default: 0.05 λ, common practice)" },
    ],
    heightMeaning: "height of the feed point (the unun)",
  },
  {
    id: "off-centre-fed",
    label: "Off-centre-fed dipole (4:1 balun)",
    parameters: [{ name: "feedPosition", meaning: "feed point as a fraction of the length from one end" }],
    heightMeaning: "height of the wire",
  },
  {
    id: "fan-dipole",
    label: "Fan dipole (two or three bands on one feed, 1:1 balun)",
    parameters: [
      { name: "bands", meaning: "2 or 3 band names, one element each" },
      { name: "spreadDeg", meaning: "extra droop of each shorter element" },
    ],
    heightMeaning: "height of the feed point and of the longest (level) element",
  },
];

export function familyModel(request: PlanRequest, elements: ElementTarget[], site: Site): FamilyModel {
  switch (request.family) {
    case "dipole":
      return dipoleModel(elements[0], site);
    case "inverted-v":
      return invertedVModel(request, elements[0], site);
    case "vertical":
      return verticalModel(request, elements[0], site);
    case "end-fed":
      return endFedModel(request, elements[0], site);
    case "off-centre-fed":
      return offCentreFedModel(request, elements[0], site);
    case "fan-dipole":
      return fanDipoleModel(request, elements, site);
  }
}
