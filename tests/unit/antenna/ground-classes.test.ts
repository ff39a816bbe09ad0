import { describe, expect, it } from "vitest";
import { GROUND_CLASSES, toSolverGround } from "@/lib/antenna/ground-classes";

describe("ground classes", () => {
  // Source: ARRL Antenna Book (recent editions) — modelling ground constants, from memory; sea and fresh water per ITU-R P.368 ground-wave curves and P.527-3 (1992) Fig. 1, from memory
  it.each([
    ["very-good", 0.0303, 20],
    ["average", 0.005, 13],
    ["poor", 0.001, 5],
    ["sea-water", 5, 70],
    ["fresh-water", 0.003, 80],
  ] as const)("%s is σ = %f S/m, εr = %f", (id, conductivitySm, relativePermittivity) => {
    expect(toSolverGround(id)).toEqual({ kind: "real", conductivitySm, relativePermittivity });
    expect(GROUND_CLASSES.find((groundClass) => groundClass.id === id)?.source).toMatch(/from memory/);
  });

  it("passes a custom ground through and names the ideal ones", () => {
    expect(toSolverGround({ conductivitySm: 0.02, relativePermittivity: 9 })).toEqual({
      kind: "real",
      conductivitySm: 0.02,
      relativePermittivity: 9,
    });
    expect(toSolverGround("perfect")).toEqual({ kind: "perfect" });
    expect(toSolverGround("free-space")).toEqual({ kind: "free" });
  });
});
