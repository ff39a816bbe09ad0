// A saved plan's parameters in words (the plan library, the station sheet); no hooks, so it
// renders on the server.
import { MODE_DUTY } from "@/lib/antenna/exposure";
import { FAMILIES } from "@/lib/antenna/families";
import { feedlineType } from "@/lib/antenna/feedline-types";
import { groundClass } from "@/lib/antenna/ground-classes";
import type { PlanRequest } from "@/lib/antenna/plan-schema";
import { formatDistance, type Units } from "@/lib/plan-screen/format";

export const familyLabel = (family: PlanRequest["family"]) => FAMILIES.find((info) => info.id === family)?.label ?? family;

export function bandsOf(parameters: PlanRequest): string {
  if (parameters.family === "fan-dipole") return parameters.bands.join(", ");
  return parameters.band ?? `${parameters.centreMHz} MHz`;
}

function groundText(ground: PlanRequest["ground"]): string {
  if (typeof ground === "object") return `σ = ${ground.conductivitySm} S/m, εr = ${ground.relativePermittivity}`;
  if (ground === "free-space") return "Free space";
  if (ground === "perfect") return "Perfect ground";
  return groundClass(ground).label;
}

function ownSettings(parameters: PlanRequest, units: Units): string[] {
  switch (parameters.family) {
    case "inverted-v":
      return [`included angle ${parameters.includedAngleDeg}°`];
    case "vertical":
      return [`${parameters.radials} radials drooping ${parameters.radialDroopDeg}°`];
    case "end-fed":
      return [
        `${parameters.unun} unun`,
        ...(parameters.farEndHeightM === undefined ? [] : [`far end at ${formatDistance(parameters.farEndHeightM, units)}`]),
        ...(parameters.counterpoiseM === undefined ? [] : [`counterpoise ${formatDistance(parameters.counterpoiseM, units)}`]),
      ];
    case "off-centre-fed":
      return [`fed at ${parameters.feedPosition.toFixed(2)} of the length`];
    case "fan-dipole":
      return [`elements spread ${parameters.spreadDeg}°`];
    default:
      return [];
  }
}

export function PlanParameters({ parameters, units }: { parameters: PlanRequest; units: Units }) {
  const rows: [string, string][] = [
    ["Family", familyLabel(parameters.family)],
    [parameters.family === "fan-dipole" ? "Bands" : "Band", bandsOf(parameters)],
    ["Height", formatDistance(parameters.heightM, units)],
    ["Wire", `${parameters.wireDiameterMm} mm ${parameters.conductor === "perfect" ? "lossless" : parameters.conductor}`],
    ["Ground", groundText(parameters.ground)],
    ["Feedline", `${formatDistance(parameters.feedline.lengthM, units)} of ${feedlineType(parameters.feedline.type).label}`],
    ["Transmitter", `${parameters.transmitter.powerW} W, ${MODE_DUTY[parameters.transmitter.mode].label}`],
  ];
  const own = ownSettings(parameters, units);
  if (own.length > 0) rows.push(["Settings", own.join("; ")]);
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
      {rows.map(([term, value]) => (
        <div key={term} className="contents">
          <dt className="font-bold">{term}</dt>
          <dd>{value}</dd>
        </div>
      ))}
    </dl>
  );
}
