// Public surface of the acoustic engine (pure TypeScript; runs on the server and in the browser).
export * from "./types";
export { OCTAVE_BANDS, BAND_COUNT, nearestBandIndex, type OctaveBand } from "./bands";
export { AcousticsInputError } from "./errors";
export {
  airAbsorptionDbPerKm,
  speedOfSound,
  saturationVapourPressureKPa,
  relaxationFrequencies,
  type AirConditions,
} from "./atmosphere";
export { aWeightingDb } from "./weighting";
export { sumLevelsDb, divergenceDb, dbToEnergy, energyToDb } from "./levels";
export { groundAttenuationDb, type GroundQuery } from "./ground";
export { regionGroundFactors, type RegionGroundFactors } from "./ground-regions";
export { directivityDb } from "./directivity";
export { DEFAULT_INSTRUMENTS, EVEREST_PEAK_LW_DB } from "./catalog";
export { instrumentLevelDb, dynamicChangeDb, shiftDynamic, dynamicIndex } from "./instrument";
export { DEFAULT_SOURCE_HEIGHT_M } from "./validate";
export { createSetEvaluator, MIN_DISTANCE_M, type SetEvaluator, type MixBuffers } from "./evaluator";
export { analyzeSet } from "./analyze";
export { positionsAtCount, positionsBetweenInto, facingBetweenDeg, transitionFraction, normalizeDeg } from "./transition";
export { exposureLimitMinutes, dailyDose, type ExposureStandard } from "./exposure";
export { toJsonSafe, type JsonSafe } from "./json";
export { cWeightingDb } from "./c-weighting";
export { fitCarryOffsets, applyCarryOffsets, type BoxReading, type FitCarryOptions, type CarryFit, type Determination } from "./calibration";
export { hearingMap, EAR_HEIGHT_M, HEARING_MIN_DISTANCE_M, type HearingOptions, type HearingMap, type PerformerHearing, type ExposureAt } from "./hearing";
export { checkBalance } from "./checks";
export { planBalance, solveBalancePlan, planCost, applyPlan, type PlanEntryDetail, type BalancePlan, type UnmetTarget, type PlanInput, type PlanCostEntry } from "./plan";
export { DEFAULT_LIMITS, LIMIT_STEPS_RANGE, resolveLimits, type MusicalLimits } from "./plan-limits";
export { PLANNED_CHECKS } from "./planned-checks";
export { DEFAULT_TARGETS, resolveTargets, TARGET_RANGES, type BalanceTargets } from "./targets";
export { loudnessIso532_1, soneToPhon, phonToSone, type Loudness, type SoundField } from "./loudness";
export { THIRD_OCTAVE_COUNT, THIRD_OCTAVE_NOMINAL_HZ } from "./loudness-tables";
export { thirdOctavesFromOctaves, thirdOctavesFromOctavesInto } from "./third-octaves";
export {
  BACKGROUND_PRESETS,
  BACKGROUND_PRESET_SPECS,
  backgroundThirdOctaves,
  validateBackground,
  thirdOctavesDbA,
  type Background,
  type BackgroundPreset,
} from "./background";
export { audibility, maskedThresholdInto, criticalBandLevelsInto, type Audibility } from "./audibility";
export { pointLoudness, type PointLoudness, type VoiceLoudness } from "./point-loudness";
