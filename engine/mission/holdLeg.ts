/**
 * Hold at constant pressure altitude for a time, at the best-endurance speed
 * (minimum drag for a jet; Anderson, Aircraft Performance and Design,
 * section 5.14), or at a set CAS. The minimum-drag Mach is searched at the
 * start mass and then flown at constant lift coefficient, Mach proportional
 * to sqrt(mass), which keeps it at minimum drag for a parabolic polar without
 * compressibility (CL_md = sqrt(CD0/K) independent of mass). A speed factor
 * flies that many times the minimum-drag speed (same scaling with mass) and a
 * minimum CAS is a floor under it. Thrust = drag at part power with a
 * maxContinuous ceiling.
 */
import { minimumDragMach } from './bestSpeeds';
import { flySegment, missionDomain } from './flySegment';
import { legFailed, legOk, segmentStopFailure, type LegOutcome } from './legOutcome';
import { makeLevelSegment } from './levelFlight';
import { BASE_STEP_S, type LegTarget, type MissionContext } from './missionContext';
import { machOfCas, missionAir } from './missionAtmosphere';
import type { HoldSpeed } from './missionTypes';
import { S_ALT, S_MASS, S_TAS, S_TIME, type StateVector } from './missionState';
import { appendCaution } from './timeHistoryBuilder';
import { checkThrustBelowDrag } from '../cautions/checks';

export type { HoldSpeed } from './missionTypes';

/** Flies a hold of `time_s` (s) at pressure altitude `altitude_m` (m) from `start`. */
export function flyHold(
  ctx: MissionContext,
  target: LegTarget,
  start: StateVector,
  altitude_m: number,
  time_s: number,
  speed: HoldSpeed,
): LegOutcome {
  const input = ctx.input;
  const dev = target.env.isaDev_K;
  const state = Float64Array.from(start);
  state[S_ALT] = altitude_m;
  if (!(time_s > 0)) return legOk(state, null);
  const mass0 = state[S_MASS];
  const pressure_Pa = missionAir(altitude_m, 0).pressure_Pa;
  const factor = speed.kind === 'bestEndurance' && speed.speedFactor !== undefined && speed.speedFactor > 0 ? speed.speedFactor : 1;
  const fixedMach = speed.kind === 'cas' ? machOfCas(speed.cas_m_s, pressure_Pa) : factor * minimumDragMach(input, altitude_m, mass0, dev);
  // Best endurance never below the set minimum CAS (the Mach of that CAS at the hold's pressure altitude).
  const floorMach = speed.kind === 'bestEndurance' && speed.minCas_m_s !== undefined && speed.minCas_m_s > 0 ? machOfCas(speed.minCas_m_s, pressure_Pa) : 0;
  const run = flySegment(
    ctx,
    target,
    makeLevelSegment(ctx, target, {
      altitudeOf: () => altitude_m,
      algebraicAltitude: false,
      machOf: (_h, m) => (speed.kind === 'cas' || !(m > 0) ? fixedMach : Math.max(fixedMach * Math.sqrt(m / mass0), floorMach)),
      ceiling: 'maxContinuous',
      step_s: BASE_STEP_S.hold * ctx.options.stepScale,
      endDistance_m: null,
      endTime_s: state[S_TIME] + time_s,
    }),
    state,
  );
  const end = run.end;
  end[S_TAS] = run.endSample.tas_m_s;
  if (run.stop === 'time_reached') {
    end[S_TIME] = state[S_TIME] + time_s;
    return legOk(end, run.endSample);
  }
  if (run.stop === 'thrust_below_drag') {
    appendCaution(ctx.log, target, checkThrustBelowDrag(run.endSample.thrustAvailable_N, run.endSample.drag_N), end[S_TIME]);
    return legFailed(end, 'thrust_below_drag', `Thrust below drag in the hold on ${target.legName}.`, run.endSample);
  }
  return segmentStopFailure(end, run, `the hold on ${target.legName}`, missionDomain(ctx, target), run.endSample);
}
