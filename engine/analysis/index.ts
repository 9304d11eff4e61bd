/**
 * engine/analysis's public surface (hand-written; docs/style.md §5): each
 * analysis as one function returning a Result with a literal error code.
 */
export type { AnalysisError } from './analysisTypes';
export { thrustDragCrossover, type CrossoverResult } from './crossover';
export { DEFAULT_RESIDUAL_CLIMB_RATES, flightEnvelope, type Ceiling, type EnvelopeQuery, type EnvelopeResult, type EnvelopeRow } from './envelope';
export { specificRange, type SpecificRangeResult } from './specificRange';
export { optimumAltitude } from './optimumAltitude';
export { payloadRangeDiagram, type PayloadRangeResult } from './payloadRange';
export { compareInlets, type InletComparisonResult, type InletFactor } from './inletComparison';
export { inletFactorBuilder, type InletPair } from './inletFactorBuilder';
export { tradeFactors, type TradeFactorsResult } from './tradeFactors';
export { RECOVERY_TRADE_DESCRIPTION, recoveryTradeByMethod, type KnownRecoveryTrade, type RecoveryMethodCase, type RecoveryTradeByMethod, type RecoveryTradeRow } from './recoveryTradeByMethod';
export type { HighSpeedLimitSource } from './crossover';
export type { LowSpeedLimitSource } from './crossover';
export { SPEED_LIMIT_SOURCE_TEXT } from './crossover';
export type { OptimumAltitudeResult } from './optimumAltitude';
export { flySerially, plannedStart, type AnalysisSteps, type MissionRound, type PlannedMission, type RoundResults, type SerialHooks } from './missionPlan';
export { compareInletsSteps, type InletComparisonOptions } from './inletComparison';
export { tradeFactorsSteps, type TradeFactorOptions } from './tradeFactors';
export { payloadRangeSteps, type PayloadRangeOptions } from './payloadRange';
