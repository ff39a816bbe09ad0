/**
 * The antenna engine's public API: what the app, the API routes and the
 * command line use. Pure TypeScript, no React, database or Next imports.
 */
export { ITU_REGIONS, BAND_NAMES, bandAt, bandByName, bandCentreMHz, bandsForRegion } from "./bands";
export type { Band, ItuRegion, AllocationStatus } from "./bands";

export { FEEDLINE_TYPES, TRANSFORMERS, feedlineType } from "./feedline-types";
export type { FeedlineType, FeedlineTypeId, Transformer, TransformerId } from "./feedline-types";
export {
  RADIO_REFERENCE_OHMS,
  gammaFromSwr,
  inputImpedance,
  lineSection,
  loadImpedance,
  matchedLossDb,
  mismatchLossDb,
  reflectionCoefficient,
  returnLossDb,
  swr,
  swrFromGamma,
  throughFeedChain,
  totalLossDb,
} from "./feedline";
export type { FeedChainPoint, LineSection } from "./feedline";

export { GROUND_CAUTION, GROUND_CLASSES, toSolverGround } from "./ground-classes";
export type { GroundChoice, GroundClass, GroundClassId } from "./ground-classes";

export { EXPOSURE_LIMITS, GROUND_REFLECTION_FACTOR, MODE_DUTY, exposureDistances } from "./exposure";
export type { ExposureDistance, ExposureRequest, ExposureResult, OperatingMode } from "./exposure";

export { FAMILIES } from "./families";
export type { FamilyInfo } from "./families";

export { FAMILY_IDS, planRequestSchema } from "./plan-schema";
export type { FamilyId, PlanRequest, PlanRequestInput } from "./plan-schema";
export { plan } from "./plan";
export type { Impedance, PlanBand, PlanElement, PlanResult, SweepPoint, SwrBandwidth, WireCurrent } from "./plan";

export { evaluate } from "./evaluate";
export type { EvaluatePoint, EvaluateResponse } from "./evaluate";
export { evaluateRequestSchema } from "./evaluate-schema";
export type { EvaluateRequest } from "./evaluate-schema";

export { ruleOfThumbLength, trim, trimRequestSchema } from "./trim";
export type { ElementTrim, PieceChange, TrimRequestInput, TrimResult } from "./trim";

export { WRAP_ALLOWANCE_NOTE, cutSheet, feetAndInches } from "./cut-sheet";
export type { CutSheet, CutSheetLine } from "./cut-sheet";

export { END_VOLTAGE_CAUTION, TOUCH_DANGER_VRMS } from "./end-voltage";
export type { EndVoltage, EndVoltages } from "./end-voltage";

export { EngineInputError } from "./problems";
