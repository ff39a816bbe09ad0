import { describe, expect, it } from "vitest";
import { formatBandwidth, formatCutLength, formatDistance, formatImpedance, formatMHz, formatSigned, formatSwr } from "@/lib/plan-screen/format";

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

  it("writes signed figures with a plus or a true minus sign, and no sign on a rounded zero", () => {
    expect(formatSigned(1.254, 2)).toBe("+1.25");
    expect(formatSigned(-0.4, 2)).toBe("−0.40");
    expect(formatSigned(-12.6, 0)).toBe("−13");
    expect(formatSigned(0, 1)).toBe("0.0");
    expect(formatSigned(-0.004, 2)).toBe("0.00");
  });

  it("writes the 2:1 bandwidth with its edges, and says when it runs off the sweep", () => {
    expect(formatBandwidth(null)).toBe("nowhere under 2:1");
    expect(formatBandwidth({ lowMHz: 14.05, highMHz: 14.25, widthKHz: 200, lowOpen: false, highOpen: false })).toBe("200 kHz (14.050–14.250 MHz)");
    expect(formatBandwidth({ lowMHz: 7.0, highMHz: 7.1234, widthKHz: 123.4, lowOpen: true, highOpen: false })).toBe("at least 123 kHz (7.000–7.123 MHz)");
  });
});
