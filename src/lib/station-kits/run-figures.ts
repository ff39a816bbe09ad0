/**
 * What a feedline run does to a station, from the engine's plan computed with that run: per
 * band, the loss and the SWR a 50 Ω radio sees, at the band's centre and at worst across it.
 * Pure: the plan result in, the figures the kit page shows out.
 */
import type { FeedlineTypeId } from "@/lib/antenna/feedline-types";
import type { PlanRequestInput } from "@/lib/antenna/plan-schema";
import type { PlanResult } from "@/lib/antenna/plan";

export interface RunBandFigures {
  band: string;
  centreMHz: number;
  /** The run's loss into a matched load, and its whole loss with the antenna's mismatch, at the centre. */
  matchedLossDb: number;
  totalLossDb: number;
  swrAtRadio: number;
  /** The highest SWR at the radio inside the band's edges. */
  worstSwrAtRadio: number;
  /** The SWR at the radio stays at or under 2:1 across the band: no tuner needed. */
  fitsUnder2to1: boolean;
}

export interface RunFigures {
  feedline: { type: FeedlineTypeId; label: string; lengthM: number };
  bands: RunBandFigures[];
}

/** The slot's plan request fed through another run of line (a coax run from the shelf). */
export function withFeedline<Request extends PlanRequestInput>(request: Request, run: { type: FeedlineTypeId; lengthM: number }): Request {
  return { ...request, feedline: { type: run.type, lengthM: run.lengthM } };
}

export function runFigures(result: PlanResult): RunFigures {
  return {
    feedline: { type: result.feedline.id, label: result.feedline.label, lengthM: result.feedline.lengthM },
    bands: result.bands.map((band) => {
      const inBand = band.sweep.filter((point) => point.mhz >= band.band.lowMHz - 1e-9 && point.mhz <= band.band.highMHz + 1e-9);
      return {
        band: band.band.name,
        centreMHz: band.centreMHz,
        matchedLossDb: band.loss.matchedDb,
        totalLossDb: band.loss.totalDb,
        swrAtRadio: band.swrAtCentre.radio,
        worstSwrAtRadio: Math.max(...inBand.map((point) => point.radio.swr)),
        fitsUnder2to1: band.bandFitsUnder2to1,
      };
    }),
  };
}
