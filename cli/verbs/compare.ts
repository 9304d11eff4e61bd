import { describeInstallationMethod } from '../../engine/propulsion';
import { compareInlets, inletFactorBuilder } from '../../engine/analysis';
import { formatQuantity, FOOT_M } from '../../engine/units';
import { checkInletName, loadVerbProject, projectArgument } from '../common/projectArgs';
import { analysisFailed, printJsonReport, printReport } from '../common/report';
import { formatTable, numberColumns, textColumns } from '../format/textTable';
import { assumptionLines } from '../format/missionSummaryText';
import { installationAssumptions } from '../../engine/project';
import { formatLoadFailure } from '../projectFiles';
import { optionalString, UsageError, type CliIo, type Verb } from '../verb';
import { bothUnits, JSON_OPTION, machText } from './analysisArgs';
import { verbSummary } from './catalogue';
import { printUncertainty, UNCERTAINTY_OPTIONS, uncertaintyOptions } from './uncertainty';

function signed(x: number | null, digits: number): string {
  if (x === null) return '-';
  return `${x >= 0 ? '+' : ''}${x.toFixed(digits)}`;
}

export const compareVerb: Verb = {
  name: 'compare',
  summary: verbSummary('compare'),
  help: `blockwise compare — two inlet designs on the same mission

Usage: blockwise compare <project.blockwise.json> [--inlets <A>,<B>]
                          [--uncertainty [--samples N] [--seed S]] [--json]

Options:
  --inlets       the two inlet designs, comma-separated (default: the project's first two)
  --uncertainty  also fly the project's declared uncertainties (a seeded Monte
                 Carlo, common random numbers for A and B) and print the band of
                 B - A, P(B burns less) and the drivers (as blockwise uncertainty)
  --samples, --seed  size and seed of that Monte Carlo (default the project's)
  --json         print the result as JSON (SI): designs (name, blockFuel_kg, ...),
                 difference (B - A) and breakdown (parts and method); with
                 --uncertainty also "uncertainty" (see blockwise uncertainty --help)

Flies the project's mission with A and with B and lists block fuel, block
time, trip fuel, take-off mass, the crossover Machs (at the cruise altitude
and A's mid-cruise mass, maxCruise) and the ceilings (maxClimb, same mass).
The block-fuel difference is split into recovery, spillage drag, external
drag and weight by Shapley values: the average effect of switching each
factor from A to B over all 24 orders of switching (16 missions). The parts
add up to the difference exactly; interactions are shared, not a residual.
Exit codes: 0 done; 1 project unreadable; 2 bad command line; 3 a mission or
analysis failed.
`,
  options: {
    inlets: { type: 'string' },
    uncertainty: { type: 'boolean' },
    ...UNCERTAINTY_OPTIONS,
    ...JSON_OPTION,
  },
  allowPositionals: true,
  async run(values, positionals, io: CliIo): Promise<number> {
    const file = projectArgument(positionals, 'compare');
    const withUncertainty = values.uncertainty === true;
    const size = uncertaintyOptions(values);
    if (!withUncertainty && (size.samples !== undefined || size.seed !== undefined)) throw new UsageError('--samples and --seed go with --uncertainty');
    const inletsText = optionalString(values, 'inlets');
    let names: [string, string] | null = null;
    if (inletsText !== undefined) {
      const parts = inletsText.split(',').map((s) => s.trim());
      if (parts.length !== 2 || parts.some((p) => p === '')) throw new UsageError(`--inlets: expected two names separated by a comma, got ${JSON.stringify(inletsText)}`);
      if (parts[0] === parts[1]) throw new UsageError(`--inlets: give two different designs (got ${JSON.stringify(parts[0])} twice)`);
      names = [parts[0]!, parts[1]!];
    }
    const loadedA = await loadVerbProject(file, names?.[0], io, '--inlets');
    if (typeof loadedA === 'number') return loadedA;
    const { project, projectPath, study, deck } = loadedA;
    if (names === null) {
      if (project.inlets.length < 2) throw new UsageError(`${file} has ${project.inlets.length} inlet design; compare needs two (add one, or give --inlets)`);
      names = [project.inlets[0]!.name, project.inlets[1]!.name];
    }
    checkInletName(project, names[1], '--inlets', file);
    const pair = study.inletPair(names[0], names[1]);
    if (!pair.ok) {
      io.err(formatLoadFailure({ file: projectPath, issues: pair.error.issues }));
      return 1;
    }
    const build = inletFactorBuilder(pair.value);
    const r = compareInlets(build, { nameA: names[0], nameB: names[1] });
    if (!r.ok) return analysisFailed(io, 'compare', r.error.message);
    const v = r.value;
    const uncertain = { project, resources: { deck }, designs: names, ...size };
    const assumptions = installationAssumptions(project, deck.hasSensitivities).map((a) => a.text);
    if (values.json === true) {
      if (withUncertainty) return printUncertainty(io, 'compare', uncertain, true, [], { installationMethod: pair.value.inputB.propulsion.installationMethod, ...v, assumptions });
      printJsonReport(io, { installationMethod: pair.value.inputB.propulsion.installationMethod, ...v, assumptions });
      return 0;
    }
    const [a, b] = v.designs;
    const d = v.difference;
    const minutes = (s: number) => (s / 60).toFixed(1);
    const ceilingRows = a.ceilings.map((c, i) => {
      const cb = b.ceilings[i];
      const ft = (m: number | null | undefined) => (m === null || m === undefined ? '-' : (m / FOOT_M).toFixed(0));
      return [`${c.name} ceiling ft`, ft(c.altitude_m), ft(cb?.altitude_m), d.ceilings[i]?.altitude_m == null ? '-' : signed(d.ceilings[i]!.altitude_m! / FOOT_M, 0)];
    });
    const cond = v.crossoverCondition;
    const lines = [
      `Inlet comparison — "${a.name}" (A) vs "${b.name}" (B), project "${project.name}"`,
      `  installation method: ${describeInstallationMethod(pair.value.inputB.propulsion.installationMethod)}`,
      '',
      formatTable(
        [...textColumns(''), ...numberColumns('A', 'B', 'B - A')],
        [
          ['block fuel kg', a.blockFuel_kg.toFixed(1), b.blockFuel_kg.toFixed(1), signed(d.blockFuel_kg, 1)],
          ['block time min', minutes(a.blockTime_s), minutes(b.blockTime_s), signed(d.blockTime_s / 60, 2)],
          ['trip fuel kg', a.tripFuel_kg.toFixed(1), b.tripFuel_kg.toFixed(1), signed(d.tripFuel_kg, 1)],
          ['take-off mass kg', a.takeoffMass_kg.toFixed(0), b.takeoffMass_kg.toFixed(0), signed(d.takeoffMass_kg, 1)],
          ['low crossover Mach', machText(a.crossover.lowMach), machText(b.crossover.lowMach), signed(d.lowMach, 4)],
          ['high crossover Mach', machText(a.crossover.highMach), machText(b.crossover.highMach), signed(d.highMach, 4)],
          ['least-thrust Mach', machText(a.crossover.minThrustMach), machText(b.crossover.minThrustMach), ''],
          ...ceilingRows,
        ],
      ),
      `  Crossovers at ${bothUnits(cond.altitude_m, 'altitude')}, ${formatQuantity(cond.mass_kg, 'mass', 'si')} (A's mid-cruise mass), ${cond.rating}; ceilings at maxClimb, same mass.`,
      '',
      `Block-fuel difference B - A = ${signed(v.breakdown.total_kg, 2)} kg, by factor (method: ${v.breakdown.method}):`,
      formatTable(
        [...textColumns('factor'), ...numberColumns('kg')],
        [...v.breakdown.parts.map((p) => [p.factor, signed(p.blockFuel_kg, 2)]), ['sum of parts', signed(v.breakdown.sumOfParts_kg, 2)]],
      ),
      `  ${v.breakdown.description}`,
      ...assumptionLines(assumptions),
    ];
    if (withUncertainty) return printUncertainty(io, 'compare', uncertain, false, [...lines, '']);
    printReport(io, lines);
    return 0;
  },
};
