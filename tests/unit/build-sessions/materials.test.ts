import { describe, expect, it } from "vitest";
import { plan } from "@/lib/antenna";
import { COAX_END_ALLOWANCE_M, SPARE_WIRE_MIN_M, coaxLengthM, kitLines, materialsFor, wirePerParticipantM, type PlanForMaterials } from "@/lib/build-sessions/materials";

const site = { region: 1, wireDiameterMm: 1.6, ground: "average", transmitter: { powerW: 100, mode: "ssb" } };
const dipole20 = plan({ ...site, family: "dipole", band: "20m", heightM: 8, feedline: { type: "rg58", lengthM: 15 } });
const endFed40 = plan({ ...site, family: "end-fed", band: "40m", heightM: 7, feedline: { type: "rg8x", lengthM: 20.2 } });
const vertical20 = plan({ ...site, family: "vertical", band: "20m", heightM: 4, radials: 4, radialDroopDeg: 30, feedline: { type: "rg58", lengthM: 10 } });

const line = (materials: ReturnType<typeof materialsFor>, prefix: string) => materials.lines.find((entry) => entry.item.startsWith(prefix))!;

describe("materials of a build session", () => {
  it("gives each participant the cut sheet's wire plus 10 % spare, at least 1 m (common practice)", () => {
    // A synthetic cut sheet: 20 m of wire to cut → 2 m spare; 5 m → the 1 m minimum.
    const withWire = (totalWireM: number): PlanForMaterials => ({ ...dipole20, cutSheet: { ...dipole20.cutSheet, totalWireM } });
    expect(wirePerParticipantM(withWire(20))).toBe(22);
    expect(wirePerParticipantM(withWire(5))).toBe(5 + SPARE_WIRE_MIN_M);
    expect(wirePerParticipantM(withWire(10.918))).toBe(12.1);
  });

  it("lands near the handbook rule for a 20 m dipole", () => {
    // common practice: L(m) = 143/f(MHz) for a half-wave dipole (the "468/f" rule in metres);
    // 14.175 MHz → 10.09 m, plus 4 wrap allowances of 0.15 m and the spare. Within 5 %.
    const rule = 143 / 14.175 + 4 * 0.15;
    const wire = wirePerParticipantM(dipole20);
    expect(wire).toBeGreaterThan(rule * 1.1 * 0.95);
    expect(wire).toBeLessThan(rule * 1.1 * 1.05);
  });

  it("counts insulators, terminals and the balun from the antenna's pieces", () => {
    const materials = materialsFor(dipole20, 6, { raisesMast: false });
    expect(line(materials, "End insulators")).toMatchObject({ perParticipant: 2, total: 12 });
    expect(line(materials, "Ring terminals")).toMatchObject({ perParticipant: 2, total: 12 });
    expect(line(materials, "1:1 current balun")).toMatchObject({ perParticipant: 1, total: 6 });
    expect(line(materials, "Coax plugs")).toMatchObject({ perParticipant: 2, total: 12 });
    expect(line(materials, "Antenna wire").total).toBeCloseTo(wirePerParticipantM(dipole20) * 6, 5);
  });

  it("hangs an end-fed from one far insulator and feeds it through its unun", () => {
    const materials = materialsFor(endFed40, 4, { raisesMast: true });
    expect(line(materials, "End insulators").perParticipant).toBe(1);
    expect(line(materials, "49:1 unun").perParticipant).toBe(1);
    // Radiator and counterpoise both end at the unun.
    expect(line(materials, "Ring terminals").perParticipant).toBe(2);
    expect(materials.kit.map((entry) => entry.item)).toContain("A portable mast with its guy kit");
  });

  it("gives a vertical an insulator at its top and at every radial's end", () => {
    const materials = materialsFor(vertical20, 1, { raisesMast: false });
    expect(line(materials, "End insulators").perParticipant).toBe(5);
    expect(line(materials, "Support cord").perParticipant).toBe(5 * (4 + 5));
  });

  it("rounds the coax up to a whole metre after the connector allowance (common practice)", () => {
    expect(coaxLengthM(dipole20)).toBe(Math.ceil(15 + COAX_END_ALLOWANCE_M));
    expect(coaxLengthM(endFed40)).toBe(21);
  });

  it("sends the analyser, the coax and the balun to the lending desk, the hand tools home", () => {
    const { kit } = materialsFor(dipole20, 1, { raisesMast: false });
    expect(kit.filter((entry) => entry.source === "borrow").map((entry) => entry.item)).toEqual([
      "An antenna analyser",
      "A coax run (RG-58), at least 16 m",
      "A 1:1 current balun",
    ]);
    expect(kitLines(kit)[0]).toBe("Wire cutters and strippers (bring)");
    expect(kit.some((entry) => entry.item.includes("mast"))).toBe(false);
  });
});
