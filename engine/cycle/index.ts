/**
 * The engine cycle model's public surface (hand-written; docs/style.md §5).
 *
 *   designEngine(spec)            parametric (design-point) cycle analysis -> Result<CycleEngine, CycleError>
 *   runCyclePoint(engine, req)    matched off-design point -> CyclePointResult (status, never NaN, never throws)
 *   parseCycleFile(text)          a *.cycle.json text -> Result<CycleSpec, CycleFileIssue[]> (located errors)
 *
 * A CycleEngine keeps its spec, the design state (every station), the design
 * summary (thrust, fuel flow, airflow, TSFC) and the sizes the off-design
 * match holds (nozzle throat areas, turbine flow parameters). A point request
 * is a flight condition, a throttle ({kind:'rating'}, {kind:'fanSpeed'} or
 * {kind:'turbineInletTemperature'}) and optional recovery, bleed fraction and
 * power extraction (defaults: the design's). Pass a converged point's `start`
 * to the next request to warm-start it (e.g. along a deck's Mach line).
 * Methods and assumptions: docs/cycle.md; file format: docs/cycle-format.md.
 */
export type { CycleSpec, CycleRating, CycleSize, CycleComponents, CycleDesignPoint, GasSection, LimitName, LimitSet, LimitValue, NozzleType } from './cycleSpec';
export { LIMIT_NAMES } from './cycleSpec';
export type { CycleEngine, CycleSizes, CycleDesignSummary } from './cycleEngine';
export type { CycleState, CycleVariables } from './cycleState';
export { MAX_CYCLE_TT4_K } from './cycleState';
export type { NozzleState } from './nozzleExit';
export type { FreeStream as CycleFreeStream } from './freeStream';
export { parseCycleFile, parseCycleData, cycleFileSchema, CYCLE_FORMAT, CYCLE_VERSION, type CycleFileIssue } from './cycleFile';
export { designEngine, type CycleError, type CycleErrorCode } from './designPoint';
export { runCyclePoint, type CyclePointRequest, type CyclePointResult, type CyclePointStatus, type CycleThrottle, type CycleWarmStart, type CycleCaution, type CycleCautionCode, MIN_CHOKED_LPT_EXPANSION } from './cyclePoint';
export { spoolSpeeds, type SpoolSpeeds } from './spoolSpeeds';
export { limitAt, LIMIT_UNITS } from './limitSchedule';
export { stationTable, type StationRow } from './stationTable';
export { cycleDeck, cycleDeckPowers, DEFAULT_CYCLE_DECK_GRID, POWER_LEVER, SENSITIVITY_STEPS, type CycleDeckGrid, type CycleDeckResult } from './cycleDeck';
export {
  matchCycleToDeck,
  deckWithCycleSensitivities,
  applyMatchParameters,
  matchDefaultBounds,
  MATCH_PARAMETERS,
  DEFAULT_MATCH_FREE,
  DEFAULT_MATCH_RATINGS,
  DEFAULT_MATCH_NODES,
  type MatchParameter,
  type CycleMatchOptions,
  type CycleMatchResult,
  type CycleMatchError,
  type MatchPointResult,
  type MatchParameterValue,
  type DeckCopyResult,
  type DeckCopyCaution,
} from './cycleMatch';
export { cycleFileOf } from './cycleFileWrite';
