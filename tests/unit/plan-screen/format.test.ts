import { describe, expect, it } from "vitest";
import { formatCutLength, formatDistance, formatImpedance, formatMHz, formatSwr } from "@/lib/plan-screen/format";

describe("plan screen number formats", () => {
  it("writes lengths in the person's units", () => {
    // Source: International Yard and Pound Agreement (1959): 1 ft = 0.3048 m exactly.
    expect(formatDistance(3.048, "imperial")).toBe("10 ft");
    expect(formatDistance(0.9144, "imperial")).toBe("3.0 ft");
    expect(formatDistance(3.048, "metric")).toBe("3.05 m");
    expect(formatDistance(12.34, "metric")).toBe("12.3 m");
    // Source: International Yard and Pound Agreement (1959): 1 in = 25.4 mm exactly.
    expect(formatCutLength(10.16, "imperial")).toBe("33 ft 4 in");
    expect(formatCutLength(10.16, "metric")).toBe("10.160 m");
  });

  it("writes an impedance as R ± jX with a true minus sign", () => {
    expect(formatImpedance({ r: 73.13, x: 42.54 })).toBe("73.1 + j42.5 Ω");
    expect(formatImpedance({ r: 64.2, x: -55.3 })).toBe("64.2 − j55.3 Ω");
  });

  it("writes SWR as a ratio and caps meaningless figures", () => {
    expect(formatSwr(1.4249)).toBe("1.42:1");
    expect(formatSwr(250)).toBe("> 99:1");
    expect(formatMHz(14.175)).toBe("14.175 MHz");
  });
});
