import { runUncertainty } from '../../engine/uncertainty';
import { MAX_UNCERTAINTY_SAMPLES } from '../../engine/project';
import { checkInletName, loadVerbProject, projectArgument } from '../common/projectArgs';
import { analysisFailed, printJsonReport, printReport } from '../common/report';
import { uncertaintyLines } from '../format/uncertaintyText';
import { assumptionLines } from '../format/missionSummaryText';
import { installationAssumptions } from '../../engine/project';
import { optionalString, UsageError, type CliIo, type Verb } from '../verb';
import { JSON_OPTION } from './analysisArgs';
import { verbSummary } from './catalogue';
import { performance } from 'node:perf_hooks';

/** `--samples N --seed S`: the Monte Carlo's size and seed (default the project's). */
export const UNCERTAINTY_OPTIONS = { samples: { type: 'string' }, seed: { type: 'string' } } as const;

function wholeOption(values: Readonly<Record<string, unknown>>, name: string, min: number, max: number): number | undefined {
  const text = optionalString(values, name);
  if (text === undefined) return undefined;
  if (!/^\d+$/.test(text.trim())) throw new UsageError(`--${name}: ${JSON.stringify(text)} is not a whole number`);
  const v = Number(text.trim());
  if (v < min || v > max) throw new UsageError(`--${name}: ${v} is out of range, expected ${min} to ${max}`);
  return v;
}

/** The --samples and --seed options, checked. */
export function uncertaintyOptions(values: Readonly<Record<string, unknown>>): { samples?: number; seed?: number } {
  const samples = wholeOption(values, 'samples', 2, MAX_UNCERTAINTY_SAMPLES);
  const seed = wholeOption(values, 'seed', 0, 4294967295);
  return { ...(samples === undefined ? {} : { samples }), ...(seed === undefined ? {} : { seed }) };
}

/** Runs the study and prints it; shared with `compare --uncertainty`. */
export function printUncertainty(
  io: CliIo,
  verb: string,
  study: Parameters<typeof runUncertainty>[0],
  asJson: boolean,
  extraLines: readonly string[] = [],
  extraJson: Readonly<Record<string, unknown>> = {},
  trailingLines: readonly string[] = [],
): number {
  const start = performance.now();
  const r = runUncertainty(study);
  const elapsed_s = (performance.now() - start) / 1000;
  if (!r.ok) return analysisFailed(io, verb, r.error.message);
  if (asJson) {
    printJsonReport(io, { ...extraJson, uncertainty: { ...r.value, elapsed_s } });
    return 0;
  }
  printReport(io, [...extraLines, ...uncertaintyLines(r.value, elapsed_s), ...trailingLines]);
  return 0;
}

export const uncertaintyVerb: Verb = {
  name: 'uncertainty',
  summary: verbSummary('uncertainty'),
  help: `blockwise uncertainty — how sure the block-fuel answer is

Usage: blockwise uncertainty <project.blockwise.json> [--inlets <A>,<B> | --inlet <A>]
                              [--samples N] [--seed S] [--json]

Options:
  --inlets   two inlet designs to compare (default: the project's first two)
  --inlet    one inlet design only (no difference)
  --samples  Monte-Carlo samples per design (default: the project's, else 200)
  --seed     sampler seed, a whole number (default: the project's, else 1)
  --json     print the result as JSON (SI): samples, seed,
             designs[].blockFuel_kg.{mean,sd,p05,p50,p95}, difference_kg.{...},
             probabilityBBetter, drivers[], values (per sample)

Flies the mission once per sample and design, with the inputs the project
declares uncertain (its "uncertainty" block: CD0, K, TSFC, OEW, C_ram,
C_bleed, recovery and lip-suction offsets) drawn by Latin hypercube sampling.
Both designs fly the same samples (common random numbers), so the band of
B - A shows what is uncertain about the difference, not about each design.
Same seed, same numbers. Exit codes: 0 done; 1 project unreadable; 2 bad
command line; 3 the project's own mission failed or too few samples flew.
`,
  options: { inlets: { type: 'string' }, inlet: { type: 'string' }, ...UNCERTAINTY_OPTIONS, ...JSON_OPTION },
  allowPositionals: true,
  async run(values, positionals, io: CliIo): Promise<number> {
    const file = projectArgument(positionals, 'uncertainty');
    const size = uncertaintyOptions(values);
    const inletsText = optionalString(values, 'inlets');
    const inletText = optionalString(values, 'inlet');
    if (inletsText !== undefined && inletText !== undefined) throw new UsageError('give --inlets or --inlet, not both');
    let names: string[] | null = null;
    if (inletsText !== undefined) {
      const parts = inletsText.split(',').map((s) => s.trim());
      if (parts.length !== 2 || parts.some((p) => p === '')) throw new UsageError(`--inlets: expected two names separated by a comma, got ${JSON.stringify(inletsText)}`);
      if (parts[0] === parts[1]) throw new UsageError(`--inlets: give two different designs (got ${JSON.stringify(parts[0])} twice)`);
      names = parts;
    } else if (inletText !== undefined) {
      names = [inletText];
    }
    const loaded = await loadVerbProject(file, names?.[0], io, inletsText !== undefined ? '--inlets' : '--inlet');
    if (typeof loaded === 'number') return loaded;
    const { project, deck } = loaded;
    if (names === null) names = project.inlets.slice(0, 2).map((i) => i.name);
    for (const n of names.slice(1)) checkInletName(project, n, '--inlets', file);
    const assumptions = installationAssumptions(project, deck.hasSensitivities).map((a) => a.text);
    return printUncertainty(io, 'uncertainty', { project, resources: { deck }, designs: names, ...size }, values.json === true, [], { assumptions }, assumptionLines(assumptions));
  },
};
