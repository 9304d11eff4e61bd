import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { thrustDragCrossover } from '../../../engine/analysis/crossover';
import { flightEnvelope } from '../../../engine/analysis/envelope';
import { compareInlets } from '../../../engine/analysis/inletComparison';
import { inletFactorBuilder } from '../../../engine/analysis/inletFactorBuilder';
import { payloadRangeDiagram } from '../../../engine/analysis/payloadRange';
import { specificRange } from '../../../engine/analysis/specificRange';
import { tradeFactors } from '../../../engine/analysis/tradeFactors';
import { expectOk } from '../../../engine/core/result';
import { prepareStudy } from '../../../engine/study';
import { buildMissionInput } from '../../../engine/project/buildMissionInput';
import { parseProject } from '../../../engine/project/parseProject';
import { parseDeckCsv } from '../../../engine/propulsion/deckCsv';
import { callCounter, type BenchSection } from '../benchTypes';

// The demo project (invented aircraft and engine); inputs cycle so each call differs.
const root = fileURLToPath(new URL('../../../fixtures/demo/', import.meta.url));
const project = expectOk(parseProject(readFileSync(`${root}demo.blockwise.json`, 'utf8'), 'demo.blockwise.json'), 'demo project');
const deck = expectOk(parseDeckCsv(readFileSync(`${root}demo-engine.deck.csv`, 'utf8'), 'demo-engine.deck.csv'), 'demo deck');
const input = expectOk(buildMissionInput(project, { deck }), 'demo input');
const models = { aero: input.aero, propulsion: input.propulsion };
const [nameA, nameB] = [project.inlets[0]!.name, project.inlets[1]!.name];
// The pair as the front doors build it (engine/study: the CLI's compare and the app's worker).
const build = inletFactorBuilder(expectOk(expectOk(prepareStudy(project, { name: 'demo-engine.deck.csv', text: readFileSync(`${root}demo-engine.deck.csv`, 'utf8') }), 'demo study').inletPair(nameA, nameB), 'inlet pair'));

const next = callCounter(8);

export const section: BenchSection = {
  title: 'analyses (demo project)',
  // Whole missions: each case warmed to the JIT's steady speed, then timed over 1.5 s (benchTypes.ts BenchSection.timing).
  timing: { warmUp_s: 3, measure_s: 1.5 },
  cases: [
    { name: 'thrustDragCrossover (81 Machs)', run: () => thrustDragCrossover(models, { altitude_m: 9000 + 100 * next(), mass_kg: 14000, rating: 'maxCruise', isaDev_K: 0 }) },
    { name: 'specificRange (61 Machs)', run: () => specificRange(models, { altitude_m: 9000 + 100 * next(), mass_kg: 14000, isaDev_K: 0 }) },
    { name: 'flightEnvelope (0-15 km by 1 km, 3 ceilings)', run: () => flightEnvelope(models, { mass_kg: 14000 + 100 * next(), rating: 'maxClimb', isaDev_K: 0, altitudeStep_m: 1000 }) },
    { name: 'payloadRangeDiagram (8 missions on the demo: no MTOW-full-fuel corner)', run: () => payloadRangeDiagram(input, {}) },
    { name: 'tradeFactors (17 missions)', run: () => tradeFactors(input, {}) },
    { name: 'compareInlets (16 missions + crossovers, ceilings)', run: () => compareInlets(build, { nameA, nameB }) },
  ],
};
