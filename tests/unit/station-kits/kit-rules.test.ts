import { describe, expect, it } from "vitest";
import { kitProblem, longestSensibleRunM, runLossAtTopDb, suggestKit, SUGGESTION_LIMITS, type KitItem, type KitNeed } from "@/lib/station-kits/kit-rules";

const FEET_PER_100 = 30.48;

let counter = 0;
function item(fields: Partial<KitItem> & Pick<KitItem, "kind">): KitItem {
  counter += 1;
  return {
    id: `item-${counter}`,
    labelCode: fields.labelCode ?? `IT-${counter}`,
    name: "Test item",
    condition: "good",
    cableType: null,
    lengthM: null,
    heightM: null,
    transformerRatio: null,
    powerRatingW: null,
    minMhz: null,
    maxMhz: null,
    ...fields,
  };
}

const coax = (labelCode: string, cableType: KitItem["cableType"], lengthM: number, condition: KitItem["condition"] = "good") => item({ kind: "coax", labelCode, cableType, lengthM, condition });

/** A 20 m station: a dipole on a 10 m mast, fed through a 1:1 balun, 30.8 m of RG-213 planned. */
const twentyMetres: KitNeed = { runM: 30.8, plannedLine: "rg213", lowMHz: 14, topMHz: 14.35, mastHeightM: 10, transformer: "1:1", powerW: 100 };

describe("the matched loss the ranking uses", () => {
  // Source: reference-data.md §5 (ARRL Antenna Book (recent editions), Transmission Lines chapter):
  // typical dB per 100 ft at 10 and 30 MHz, from memory (±20 %).
  it.each([
    ["rg213", 10, 0.6],
    ["rg213", 30, 1.1],
    ["rg8x", 10, 1.0],
    ["rg8x", 30, 1.9],
    ["rg58", 10, 1.4],
    ["rg58", 30, 2.5],
  ] as const)("is the handbook's figure for 100 ft of %s at %d MHz (%f dB)", (cableType, mhz, handbookDb) => {
    const loss = runLossAtTopDb({ cableType, lengthM: FEET_PER_100 }, { topMHz: mhz });
    expect(Math.abs(loss - handbookDb) / handbookDb).toBeLessThan(0.2);
  });

  it("grows in proportion to the length", () => {
    const short = runLossAtTopDb({ cableType: "rg213", lengthM: 20 }, twentyMetres);
    const long = runLossAtTopDb({ cableType: "rg213", lengthM: 40 }, twentyMetres);
    expect(long).toBeCloseTo(2 * short, 10);
  });
});

describe("which coax runs suit a slot", () => {
  it("needs at least the slot's run, and not absurdly more", () => {
    // common practice: half as long again, and at least 10 m of spare, is the most worth carrying
    expect(longestSensibleRunM(30.8)).toBeCloseTo(46.2, 10);
    expect(longestSensibleRunM(12)).toBe(22);
    expect(kitProblem(coax("CX-A", "rg213", 30), twentyMetres)).toMatch(/shorter than the slot's feedline run of 30.8 m/);
    expect(kitProblem(coax("CX-B", "rg213", 30.8), twentyMetres)).toBeNull();
    expect(kitProblem(coax("CX-C", "rg213", 46.2), twentyMetres)).toBeNull();
    expect(kitProblem(coax("CX-D", "rg213", 50), twentyMetres)).toMatch(/far longer than the run/);
  });

  it("needs the characteristic impedance the plan is fed with", () => {
    expect(kitProblem(coax("CX-E", "rg6", 40), twentyMetres)).toMatch(/75 Ω/);
    expect(kitProblem(coax("CX-F", "window450", 40), twentyMetres)).toMatch(/450 Ω/);
    // Any 50 Ω coax suits a plan made for RG-213: the engine computes its own loss.
    expect(kitProblem(coax("CX-G", "rg58", 35), twentyMetres)).toBeNull();
  });

  it("leaves out retired runs and runs that need repair", () => {
    expect(kitProblem(coax("CX-H", "rg213", 35, "needs_repair"), twentyMetres)).toMatch(/needs repair/);
    expect(kitProblem(coax("CX-I", "rg213", 35, "retired"), twentyMetres)).toMatch(/retired/);
    expect(kitProblem(coax("CX-J", "rg213", 35, "worn"), twentyMetres)).toBeNull();
  });

  it("ranks the suitable runs by their loss at the station's highest frequency", () => {
    const shelf = [
      coax("CX-58", "rg58", 32),
      coax("CX-8X", "rg8x", 35),
      coax("CX-40", "rg213", 40),
      coax("CX-35", "rg213", 35),
      coax("CX-30", "rg213", 30),
      coax("CX-50", "rg213", 50),
      coax("CX-75", "rg6", 40),
    ];
    const ranked = suggestKit(shelf, twentyMetres).coax;
    expect(ranked.map((run) => run.labelCode)).toEqual(["CX-35", "CX-40", "CX-8X", "CX-58"]);
    // At 14.35 MHz (reference-data.md §5 fits, per 100 m): RG-213 2.379 dB, RG-8X 4.028 dB, RG-58 5.420 dB.
    // Source: reference-data.md §5 (k1·√f + k2·f fitted to the ARRL Antenna Book's typical figures, from memory)
    expect(ranked.map((run) => runLossAtTopDb(run, twentyMetres))).toEqual([
      expect.closeTo(0.833, 3),
      expect.closeTo(0.952, 3),
      expect.closeTo(1.41, 2),
      expect.closeTo(1.734, 3),
    ]);
  });

  it("offers at most a few runs", () => {
    const shelf = Array.from({ length: 10 }, (_, index) => coax(`CX-${10 + index}`, "rg213", 31 + index));
    const ranked = suggestKit(shelf, twentyMetres).coax;
    expect(ranked).toHaveLength(SUGGESTION_LIMITS.coax);
    expect(ranked.map((run) => run.lengthM)).toEqual([31, 32, 33, 34]);
  });
});

describe("the rest of a station's kit", () => {
  it("offers masts that reach the plan's mast height, the lowest first", () => {
    const masts = [6, 18, 10, 12].map((heightM) => item({ kind: "mast", labelCode: `MA-${heightM}`, heightM }));
    masts.push(item({ kind: "mast", labelCode: "MA-BROKEN", heightM: 12, condition: "needs_repair" }));
    expect(suggestKit(masts, twentyMetres).mast.map((mast) => mast.labelCode)).toEqual(["MA-10", "MA-12", "MA-18"]);
    expect(kitProblem(masts[0], twentyMetres)).toMatch(/lower than the plan's mast of 10 m/);
  });

  it("offers the balun or unun of the family's ratio, rated for the station's power", () => {
    const shelf = [
      item({ kind: "balun", labelCode: "BU-1K", transformerRatio: "1:1", powerRatingW: 1000 }),
      item({ kind: "balun", labelCode: "BU-200", transformerRatio: "1:1", powerRatingW: 200 }),
      item({ kind: "balun", labelCode: "BU-50", transformerRatio: "1:1", powerRatingW: 50 }),
      item({ kind: "balun", labelCode: "BU-4", transformerRatio: "4:1", powerRatingW: 500 }),
      item({ kind: "balun", labelCode: "BU-49", transformerRatio: "49:1", powerRatingW: 100 }),
      item({ kind: "balun", labelCode: "BU-64", transformerRatio: "64:1", powerRatingW: 100 }),
    ];
    expect(suggestKit(shelf, twentyMetres).balun.map((balun) => balun.labelCode)).toEqual(["BU-200", "BU-1K"]);
    expect(kitProblem(shelf[2], twentyMetres)).toMatch(/rated for 50 W/);
    expect(suggestKit(shelf, { ...twentyMetres, transformer: "4:1" }).balun.map((balun) => balun.labelCode)).toEqual(["BU-4"]);
    expect(suggestKit(shelf, { ...twentyMetres, transformer: "49:1" }).balun.map((balun) => balun.labelCode)).toEqual(["BU-49"]);
  });

  it("offers analysers that cover the station's bands, the narrowest first", () => {
    const shelf = [
      item({ kind: "analyser", labelCode: "AN-WIDE", minMhz: 0.1, maxMhz: 170 }),
      item({ kind: "analyser", labelCode: "AN-HF", minMhz: 1.8, maxMhz: 30 }),
      item({ kind: "analyser", labelCode: "AN-60", minMhz: 1, maxMhz: 60 }),
    ];
    expect(suggestKit(shelf, twentyMetres).analyser.map((analyser) => analyser.labelCode)).toEqual(["AN-HF", "AN-60", "AN-WIDE"]);
    // Source: reference-data.md §1 (ITU Radio Regulations, Art. 5): 2 m is 144–146 MHz in Region 1.
    const twoMetres = { ...twentyMetres, lowMHz: 144, topMHz: 146 };
    expect(suggestKit(shelf, twoMetres).analyser.map((analyser) => analyser.labelCode)).toEqual(["AN-WIDE"]);
    expect(kitProblem(shelf[1], twoMetres)).toMatch(/covers 1.8–30 MHz/);
  });

  it("has no rule for other kinds of gear", () => {
    expect(kitProblem(item({ kind: "tuner" }), twentyMetres)).toBeNull();
  });
});
