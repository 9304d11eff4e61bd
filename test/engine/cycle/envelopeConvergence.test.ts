import { describe, expect, it } from 'vitest';
import { runCyclePoint } from '../../../engine/cycle/index';
import { RATING_NAMES } from '../../../engine/propulsion/propulsionModel';
import { designedCycle, DEMO_CYCLE, ft } from './cycleFixtures';

// The demo engine over the flight envelope the deck generator covers: 0 to 45,000 ft, Mach 0 to
// 0.9, ISA-20 to ISA+30, at every rating. Each point must match (status converged) with every
// reported number finite, and a rating never exceeds the limits in force.
describe('demo cycle over the flight envelope', () => {
  const engine = designedCycle(DEMO_CYCLE);
  for (const rating of RATING_NAMES) {
    it(`converges at every point of the envelope at ${rating}`, () => {
      let converged = 0;
      let total = 0;
      const failures: string[] = [];
      for (let altitude = 0; altitude <= 45000; altitude += 5000) {
        for (let i = 0; i <= 9; i++) {
          for (const isa of [-20, 0, 15, 30]) {
            const mach = i / 10;
            const p = runCyclePoint(engine, { altitude_m: ft(altitude), mach, isaDeviation_K: isa, throttle: { kind: 'rating', rating } });
            total++;
            if (p.status !== 'converged') {
              failures.push(`${altitude} ft M${mach} ISA${isa}: ${p.status} ${p.message}`);
              continue;
            }
            converged++;
            for (const v of [p.thrust_N, p.fuelFlow_kg_s, p.airflow_kg_s, p.fanSpeed, p.fanCorrectedSpeed, p.turbineInletTemperature_K, p.residual]) {
              expect(Number.isFinite(v)).toBe(true);
            }
            expect(p.residual!).toBeLessThanOrEqual(1e-11);
          }
        }
      }
      expect(failures, `${converged}/${total} converged`).toEqual([]);
    });
  }
});
