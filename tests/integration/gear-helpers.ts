// Gear for integration tests: each test adds its own items with unique label codes.
import { randomBytes } from "node:crypto";
import { createItem } from "@/server/services/gear";
import type { Actor } from "@/server/policy";
import type { GearItemInput } from "@/validations/gear";
import { createPerson } from "./helpers";

export const uniqueLabel = (prefix: string) => `${prefix}-${randomBytes(3).toString("hex").toUpperCase()}`;

let steward: Actor | undefined;
export async function testSteward(): Promise<Actor> {
  steward ??= await createPerson("steward", { isMentor: true, name: "Test steward" });
  return steward;
}

export async function addAnalyser(overrides: Partial<Extract<GearItemInput, { kind: "analyser" }>> = {}) {
  return createItem(await testSteward(), {
    kind: "analyser",
    labelCode: uniqueLabel("AN"),
    name: "Test analyser",
    condition: "good",
    location: "Test cupboard",
    notes: null,
    minMhz: 1,
    maxMhz: 60,
    batteryCheckedOn: null,
    calibrationCheckedOn: null,
    ...overrides,
  });
}

export async function addCoaxRun(overrides: Partial<Extract<GearItemInput, { kind: "coax" }>> = {}) {
  return createItem(await testSteward(), {
    kind: "coax",
    labelCode: uniqueLabel("CX"),
    name: "Test coax run",
    condition: "good",
    location: "Test crate",
    notes: null,
    cableType: "rg213",
    lengthM: 20,
    connectorA: "pl259",
    connectorB: "pl259",
    ...overrides,
  });
}

/** A wall-clock time in the test club's zone (Europe/London), `days` from now at `hour`:00. */
export function clubTime(days: number, hour: number): string {
  const date = new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);
  return `${date}T${String(hour).padStart(2, "0")}:00`;
}
