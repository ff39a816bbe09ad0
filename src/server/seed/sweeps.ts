// The demo's measured sweeps: the 20 m end-fed of last autumn's antenna day, swept at the radio
// end before and after trimming by a member on that slot's shift with a club analyser.
//
// The readings are computed, not invented: the engine's model of the slot's geometry, with the
// real wire behaving as the model would 3 % higher up the band (so it resonates 3 % low, as
// insulators, the wire's coating and nearby trees typically pull a wire antenna), carried
// through the 49:1 unun and the slot's RG-213 run to the radio with the lossy-line formula, and
// rounded as an analyser's export is. The "after" sweep is of the wire trimmed as Guyline advised
// from the first one, rounded to the centimetre a tape measure gives.
import { and, eq } from "drizzle-orm";
import { complex, divide, type Complex } from "mathjs";
import { RADIO_REFERENCE_OHMS, TRANSFORMERS, feedlineType, inputImpedance, lineSection, swr, type ItuRegion } from "@/lib/antenna";
import { plan, planModel, type PlanResult } from "@/lib/antenna/plan";
import { planRequestSchema, type PlanRequest } from "@/lib/antenna/plan-schema";
import { prepareStructure, solveSweep } from "@/lib/antenna/solver";
import { trim } from "@/lib/antenna/trim";
import { planRequestForSlot } from "@/lib/antenna-days/slot-plan";
import { instantToWallTime, wallTimeToInstant } from "@/lib/time";
import { analysisOf, compareSweep, trimRequestOf, type SweepAnalysis, type TrimOutcome } from "@/lib/sweeps/analysis";
import { readSweepText, type MeasuredPoint, type SweepMapping } from "@/lib/sweeps/parse";
import type { Transaction } from "@/server/db";
import { antennaDays, gearItems, measuredSweeps, sites, stationSlots } from "@/server/db/schema";
import { storeFile, uploadRules } from "@/server/storage/files";
import { demoUserId } from "./people";

const PAST_DAY = "Autumn antenna day";
const SLOT = "Twenty end-fed";
const MEASURED_BY = "lena@demo.test";
const ANALYSER = "AN-02";
/** The real antenna resonates this fraction below the model of the same wire. */
const DEMO_OFFSET = -0.03;
/** 13.70–14.60 MHz in 10 kHz steps: the analyser's sweep across 20 m and a little beyond. */
const SWEEP_MHZ = Array.from({ length: 91 }, (_, i) => 13.7 + i * 0.01);

/** What an analyser at the radio end reads for the real wire with the given element lengths. */
function radioEndReadings(request: PlanRequest, result: PlanResult, lengthsM: number[]): { mhz: number; z: Complex }[] {
  const top = Math.max(...SWEEP_MHZ) / (1 + DEMO_OFFSET);
  const model = planModel(request, () => top);
  const prepared = prepareStructure(model.build(lengthsM).structure, top);
  const line = feedlineType(result.feedline.id);
  return solveSweep(
    prepared,
    SWEEP_MHZ.map((mhz) => mhz / (1 + DEMO_OFFSET)),
  ).map((solution, i) => {
    const mhz = SWEEP_MHZ[i];
    const zLineEnd = divide(complex(solution.impedance.r, solution.impedance.x), TRANSFORMERS[result.transformer.id].impedanceRatio) as Complex;
    return { mhz, z: inputImpedance(zLineEnd, lineSection(line, mhz, result.feedline.lengthM)) };
  });
}

/** The readings as the analyser exports them: kHz, R and X to 0.1 Ω, SWR to 0.01. */
function exportText(readings: { mhz: number; z: Complex }[], title: string): string {
  const rows = readings.map(({ mhz, z }) => `${(mhz * 1000).toFixed(1)},${z.re.toFixed(1)},${z.im.toFixed(1)},${swr(z, RADIO_REFERENCE_OHMS).toFixed(2)}`);
  return [`# ${title}`, "Frequency (kHz),R (ohm),X (ohm),SWR", ...rows].join("\r\n") + "\r\n";
}

function analyse(result: PlanResult, text: string, builtLengthsM: number[] | null): { analysis: SweepAnalysis; points: MeasuredPoint[]; mapping: SweepMapping } {
  const reading = readSweepText(text);
  if (reading.problems.length > 0 || !reading.mapping) throw new Error(`The demo sweep does not read: ${JSON.stringify(reading.problems)}`);
  const comparison = compareSweep(reading.points, "radio-end", result);
  const trimRequest = trimRequestOf(result.request, result, comparison.bands, builtLengthsM);
  if (!trimRequest.ok) throw new Error(`The demo sweep gives no trim: ${trimRequest.reason}`);
  const trimResult = trim(trimRequest.input);
  const outcome: TrimOutcome = { ok: true, result: trimResult, builtLengthsM: trimResult.elements.map((element) => element.builtLengthM), builtFrom: builtLengthsM ? "uploader" : "plan" };
  return { analysis: analysisOf(comparison, outcome, builtLengthsM === null), points: reading.points, mapping: reading.mapping };
}

export async function seedSweeps(tx: Transaction, settings: { timeZone: string; ituRegion: number }): Promise<void> {
  const day = await tx.query.antennaDays.findFirst({ where: eq(antennaDays.title, PAST_DAY) });
  if (!day) return;
  const slot = await tx.query.stationSlots.findFirst({ where: and(eq(stationSlots.dayId, day.id), eq(stationSlots.name, SLOT)) });
  const site = await tx.query.sites.findFirst({ where: eq(sites.id, day.siteId) });
  const analyser = await tx.query.gearItems.findFirst({ where: eq(gearItems.labelCode, ANALYSER) });
  if (!slot || !site || !analyser) return;
  if (await tx.query.measuredSweeps.findFirst({ where: eq(measuredSweeps.slotId, slot.id) })) return;

  const request = planRequestSchema.parse(
    planRequestForSlot(
      { bands: slot.bands, powerW: slot.powerW, mode: slot.mode, planParams: slot.planParams, position: [slot.x, slot.y], tent: [slot.tentX, slot.tentY], feedlineRunOverrideM: slot.feedlineRunOverrideM },
      site,
      settings.ituRegion as ItuRegion,
    ),
  );
  const result = plan(request);
  const cutLengths = result.elements.map((element) => element.lengthM);
  const beforeText = exportText(radioEndReadings(request, result, cutLengths), "Twenty end-fed, as cut, at the tent");
  const before = analyse(result, beforeText, null);
  if (!before.analysis.trim.ok || !before.analysis.trim.result.engine) throw new Error("The demo's first sweep gives no engine trim.");
  // Cut to the engine's answer, to the centimetre.
  const trimmed = before.analysis.trim.result.elements.map((element) => Math.round((element.engineLengthM as number) * 100) / 100);
  const afterText = exportText(radioEndReadings(request, result, trimmed), "Twenty end-fed, after trimming, at the tent");
  const after = analyse(result, afterText, trimmed);

  const uploadedBy = await demoUserId(tx, MEASURED_BY);
  const date = instantToWallTime(day.startsAt, settings.timeZone).slice(0, 10);
  const sweeps = [
    { sweep: before, text: beforeText, built: null, at: "10:40", fileName: "twenty-end-fed-before.csv", note: "As cut from the plan, measured at the tent through the coax run." },
    {
      sweep: after,
      text: afterText,
      built: trimmed,
      at: "11:35",
      fileName: "twenty-end-fed-after.csv",
      note: `After taking ${Math.round((cutLengths[0] - trimmed[0]) * 100)} cm off the far end of the radiator.`,
    },
  ];
  for (const { sweep, text, built, at, fileName, note } of sweeps) {
    const file = await storeFile(tx, uploadRules.sweep, { bytes: new TextEncoder().encode(text), fileName, uploadedBy });
    const { points } = sweep;
    await tx.insert(measuredSweeps).values({
      slotId: slot.id,
      fileId: file.id,
      uploadedBy,
      analyserId: analyser.id,
      place: "radio-end",
      quantity: sweep.mapping.quantity,
      measuredAt: wallTimeToInstant(`${date}T${at}`, settings.timeZone),
      mapping: sweep.mapping,
      points,
      pointCount: points.length,
      minMhz: points[0].mhz,
      maxMhz: points[points.length - 1].mhz,
      builtLengthsM: built,
      planRequest: result.request,
      analysis: sweep.analysis,
      note,
    });
  }
}
