import { describe, expect, it } from "vitest";
import { planRequestSchema } from "@/lib/antenna";
import { designBand, feedlineRun, FEEDLINE_SLACK_FIXED_M, planRequestForSlot, slotFieldOfPlanPath, slotPlanParamsOf, type SlotForPlan } from "@/lib/antenna-days/slot-plan";

const dipoleSlot: SlotForPlan = {
  bands: ["20m", "40m"],
  powerW: 100,
  mode: "ssb",
  planParams: { family: "dipole", heightM: 10, wireDiameterMm: 2, feedlineType: "rg213" },
  position: [0, 0],
  tent: [30, 40],
  feedlineRunOverrideM: null,
};
const averageGround = { groundClass: "average" as const, groundConductivitySm: null, groundRelativePermittivity: null };

describe("the feedline run", () => {
  // common practice: slack of 2 m plus 10 % of the ground run (drip loop, service loop, routing).
  it("adds the distance to the tent, the height of the feed point and the slack", () => {
    const run = feedlineRun({ position: [0, 0], tent: [30, 40], feedHeightM: 10, overrideM: null });
    expect(run).toMatchObject({ groundM: 50, mastM: 10, slackM: FEEDLINE_SLACK_FIXED_M + 5, computedM: 67, lengthM: 67, overrideM: null });
  });

  it("uses the coordinator's figure when given, keeping the computed one beside it", () => {
    const run = feedlineRun({ position: [10, 10], tent: [10, 10], feedHeightM: 6, overrideM: 25 });
    expect(run.computedM).toBe(8);
    expect(run.lengthM).toBe(25);
  });
});

describe("the plan request for a slot", () => {
  it("cuts a single-band antenna for the slot's lowest band and takes ground, coax run, power and mode from the slot and site", () => {
    const request = planRequestForSlot(dipoleSlot, averageGround, 1);
    expect(request).toEqual({
      family: "dipole",
      heightM: 10,
      wireDiameterMm: 2,
      band: "40m",
      region: 1,
      ground: "average",
      feedline: { type: "rg213", lengthM: 67 },
      transmitter: { powerW: 100, mode: "ssb" },
    });
    expect(planRequestSchema.safeParse(request).success).toBe(true);
  });

  it("gives a fan dipole every band of the slot", () => {
    const request = planRequestForSlot({ ...dipoleSlot, bands: ["20m", "15m", "10m"], planParams: { family: "fan-dipole", heightM: 9, wireDiameterMm: 2, feedlineType: "rg8x" } }, averageGround, 2);
    expect(request).toMatchObject({ family: "fan-dipole", bands: ["20m", "15m", "10m"], region: 2 });
    expect(request).not.toHaveProperty("band");
    expect(planRequestSchema.safeParse(request).success).toBe(true);
  });

  it("passes a custom ground as σ and εr", () => {
    // Source: ITU-R P.368 ground-wave curves and P.527-3 (1992), wet ground σ = 0.01 S/m, εr = 30 (from memory, reference-data.md §7)
    const request = planRequestForSlot(dipoleSlot, { groundClass: "custom", groundConductivitySm: 0.01, groundRelativePermittivity: 30 }, 1);
    expect(request.ground).toEqual({ conductivitySm: 0.01, relativePermittivity: 30 });
  });

  it("leaves an unknown band to the engine's schema, which names it", () => {
    expect(designBand(["20m", "11m"], 1)).toBe("11m");
    const result = planRequestSchema.safeParse(planRequestForSlot({ ...dipoleSlot, bands: ["11m"] }, averageGround, 1));
    expect(result.success).toBe(false);
    expect(result.error?.issues[0].path).toEqual(["band"]);
    expect(slotFieldOfPlanPath("band")).toBe("bands");
  });

  it("uses the override for the feedline when the coordinator set one", () => {
    expect(planRequestForSlot({ ...dipoleSlot, feedlineRunOverrideM: 42 }, averageGround, 1).feedline).toEqual({ type: "rg213", lengthM: 42 });
  });
});

describe("the slot's own plan parameters", () => {
  it("strip what the slot and the site own from a full request, keeping the coax type", () => {
    const request = planRequestSchema.parse({
      family: "inverted-v",
      band: "40m",
      region: 1,
      heightM: 9,
      wireDiameterMm: 2,
      ground: "poor",
      feedline: { type: "rg8x", lengthM: 30 },
      transmitter: { powerW: 50, mode: "cw" },
    });
    expect(slotPlanParamsOf(request)).toEqual({ family: "inverted-v", heightM: 9, wireDiameterMm: 2, conductor: "copper", includedAngleDeg: 120, feedlineType: "rg8x" });
  });

  it("name each engine problem by the slot's own field", () => {
    expect(slotFieldOfPlanPath("heightM")).toBe("planParams.heightM");
    expect(slotFieldOfPlanPath("bands[1]")).toBe("bands");
    expect(slotFieldOfPlanPath("transmitter.powerW")).toBe("powerW");
    expect(slotFieldOfPlanPath("feedline.lengthM")).toBe("feedlineRunOverrideM");
    expect(slotFieldOfPlanPath("feedline.type")).toBe("planParams.feedlineType");
  });
});
