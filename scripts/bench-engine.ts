/**
 * `npm run bench:engine`: speed of the antenna engine, printed from one run.
 *
 * (a) a fan dipole and (b) a three-element Yagi (the cross-check geometries
 * of scripts/lib/nec2c.ts), each a 41-point sweep including the preparation
 * of the structure; with nec2c installed, nec2c on the same geometry and
 * segmentation, and the ratio (target ≤ 1.0).
 *
 * The machine may be busy, so the engine and nec2c run in turns, in rounds
 * over all cases, after a warm-up, and the figures are medians. Times are
 * CPU times, what each program itself spends (nec2c's own "TOTAL RUN TIME"
 * counts in 10 ms steps, so it runs ten sweeps per process and the figure is
 * divided by ten); wall-clock medians are shown too, nec2c's including its
 * process start and output file.
 */
import { prepareStructure, solveSweep } from "../src/lib/antenna/solver";
import { CROSS_CHECK_CASES, necDeck, nec2cInstalled, runNec2c, sweepFrequencies, type CrossCheckCase } from "./lib/nec2c";
import { benchPlanRecompute, printPlanBench } from "./lib/bench-plan";

const RUNS = 15;
const NEC_REPEAT = 10;

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 === 1 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

/** The cross-check case with its sweep stretched to 41 points over the same band. */
function sweep41(name: string): CrossCheckCase {
  const c = CROSS_CHECK_CASES.find((candidate) => candidate.name === name);
  if (c === undefined) throw new Error(`no cross-check case ${name}`);
  const span = c.sweep.stepMHz * (c.sweep.count - 1);
  return { ...c, sweep: { startMHz: c.sweep.startMHz, stepMHz: Number((span / 40).toFixed(6)), count: 41 } };
}

interface Timing {
  cpuMs: number;
  wallMs: number;
}

function timeEngine(c: CrossCheckCase): Timing {
  const frequencies = sweepFrequencies(c.sweep);
  const cpu = process.cpuUsage();
  const started = performance.now();
  solveSweep(prepareStructure(c.structure, Math.max(...frequencies)), frequencies);
  const wallMs = performance.now() - started;
  const used = process.cpuUsage(cpu);
  return { cpuMs: (used.user + used.system) / 1000, wallMs };
}

function timeNec2c(c: CrossCheckCase): Timing {
  const single = runNec2c(necDeck(c, { quiet: true }));
  const repeated = runNec2c(necDeck(c, { quiet: true, repeat: NEC_REPEAT }));
  const total = /TOTAL RUN TIME:\s*([0-9.]+)\s*msec/.exec(repeated.output);
  if (total === null) throw new Error("nec2c printed no TOTAL RUN TIME");
  return { cpuMs: Number(total[1]) / NEC_REPEAT, wallMs: single.milliseconds };
}

interface BenchCase {
  label: string;
  case: CrossCheckCase;
}

const CASES: BenchCase[] = [
  { label: "(a) fan dipole, 41-point sweep", case: sweep41("fan-dipole-20m") },
  { label: "(b) three-element Yagi, 41-point sweep", case: sweep41("yagi-3-element") },
];

function main(): void {
  const withNec2c = nec2cInstalled();
  console.log(`Antenna engine benchmark: medians of ${RUNS} runs${withNec2c ? ", the engine and nec2c in turns" : " (nec2c not installed)"}`);
  // Warm-up: let the JIT compile the hot paths before anything is timed (its threads count as CPU time).
  for (let run = 0; run < 10; run++) for (const { case: c } of CASES) timeEngine(c);
  // Rounds over all cases, so that a change in the machine's load falls on every case alike.
  const ours = CASES.map((): Timing[] => []);
  const theirs = CASES.map((): Timing[] => []);
  for (let run = 0; run < RUNS; run++) {
    CASES.forEach(({ case: c }, i) => {
      ours[i].push(timeEngine(c));
      if (withNec2c) theirs[i].push(timeNec2c(c));
    });
  }
  CASES.forEach(({ label, case: c }, i) => {
    const segments = prepareStructure(c.structure, Math.max(...sweepFrequencies(c.sweep))).segmentCount;
    const oursCpu = median(ours[i].map((t) => t.cpuMs));
    const oursWall = median(ours[i].map((t) => t.wallMs));
    console.log(`${label} (${segments} segments)`);
    console.log(`  engine: ${oursCpu.toFixed(1)} ms CPU, ${oursWall.toFixed(1)} ms wall`);
    if (withNec2c) {
      const necCpu = median(theirs[i].map((t) => t.cpuMs));
      const necWall = median(theirs[i].map((t) => t.wallMs));
      console.log(`  nec2c:  ${necCpu.toFixed(1)} ms CPU, ${necWall.toFixed(1)} ms wall (one process per sweep)`);
      console.log(`  ratio engine/nec2c: ${(oursCpu / necCpu).toFixed(2)} CPU, ${(oursWall / necWall).toFixed(2)} wall (target ≤ 1.0)`);
    }
  });
  // (c) a dipole plan recompute (target < 20 ms median): Engine B's section.
  printPlanBench(benchPlanRecompute(RUNS));
}

main();
