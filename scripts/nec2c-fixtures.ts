/**
 * `npx tsx scripts/nec2c-fixtures.ts`: writes a NEC-2 deck for every
 * cross-check geometry, runs nec2c (Debian package `nec2c`, a general-purpose
 * NEC-2 solver used only as a reference), and writes its feed-point impedances
 * to tests/fixtures/nec2c/<name>.json, then prints how the engine compares.
 */
import { mkdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { prepareStructure, solveAt } from "../src/lib/antenna/solver";
import { CROSS_CHECK_CASES, compareSweeps, necDeck, nec2cInstalled, runCase, type Fixture } from "./lib/nec2c";

const FIXTURE_DIR = join(__dirname, "..", "tests", "fixtures", "nec2c");

function percent(x: number): string {
  return `${(100 * x).toFixed(2)} %`;
}

function main(): void {
  if (!nec2cInstalled()) {
    console.error("nec2c is not installed (Debian: apt-get install nec2c)");
    process.exitCode = 1;
    return;
  }
  mkdirSync(FIXTURE_DIR, { recursive: true });
  console.log("case                         resonance   shift    worst R   worst X (share of 3 Ω + 3 % |Z|)");
  for (const c of CROSS_CHECK_CASES) {
    const { points } = runCase(c);
    const fixture: Fixture = { case: c, deck: necDeck(c), nec2c: points };
    writeFileSync(join(FIXTURE_DIR, `${c.name}.json`), `${JSON.stringify(fixture, null, 2)}\n`);
    const prepared = prepareStructure(c.structure, Math.max(...points.map((p) => p.mhz)) * 1.01);
    const result = compareSweeps(points, (mhz) => solveAt(prepared, mhz));
    console.log(
      `${c.name.padEnd(28)} ${percent(result.resonanceOffset).padStart(8)} ${percent(result.shift).padStart(8)} ${percent(result.worstR).padStart(9)}   ${result.worstXOhms.toFixed(2)} Ω (${result.worstXShare.toFixed(2)})${result.passes ? "" : "  FAILS"}`,
    );
  }
}

main();
