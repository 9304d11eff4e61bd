import { installationAssumptions } from '../../engine/project';
import { writeFile } from 'node:fs/promises';
import { resolve } from 'node:path';
import { solveMission } from '../../engine/mission';
import { loadVerbProject, projectArgument } from '../common/projectArgs';
import { historyCsv, type CsvUnits } from '../../engine/study';
import { missionJson } from '../format/missionJson';
import { missionSummaryText } from '../format/missionSummaryText';
import { optionalString, printJson, UsageError, type CliIo, type Verb } from '../verb';
import { INLET_OPTION, JSON_OPTION } from './analysisArgs';
import { missionExitCode } from '../exitCodes';
import { verbSummary } from './catalogue';


export const flyVerb: Verb = {
  name: 'fly',
  summary: verbSummary('fly'),
  help: `blockwise fly — fly the mission of a project file

Usage: blockwise fly <project.blockwise.json> [--inlet <name>] [--json] [--csv <file> [--csv-units base|si|customary]]

Options:
  --inlet   fly with this inlet design instead of the project's active one
  --json    print the result as JSON (SI values; each key names its unit)
  --csv     also write the time history to <file> (docs/results-csv.md: name[unit] columns)
  --csv-units  what its numbers are in: base (default: SI base units s, m, kg, N,
            kg/s, for programs), si or customary (the display units the app's
            screens and exports use: min, km, kg/h ... or h, nmi, kt, lb, lbf ...)

The deck file a project names is read relative to the project file's folder.
The project format is described in docs/project-format.md.

Exit codes: 0 flown, status ok; 1 the project (or its deck) cannot be read,
with each problem's JSON path and reason; 2 bad command line; 3 no solution
(did not converge, infeasible); 4 the destination cannot be reached (fuel
exhausted, climb or thrust short, no ground progress, outside the models'
range); 5 a hard limit is broken (MTOW, fuel capacity, MLW); 70 internal
error. The result is printed whatever the status.
`,
  options: { ...INLET_OPTION, ...JSON_OPTION, csv: { type: 'string' }, 'csv-units': { type: 'string' } },
  allowPositionals: true,
  async run(values, positionals, io: CliIo): Promise<number> {
    const file = projectArgument(positionals, 'fly');
    const csvOption = optionalString(values, 'csv');
    if (csvOption !== undefined && csvOption.trim() === '') throw new UsageError('--csv: give a file name');
    const csvUnitsOption = optionalString(values, 'csv-units');
    if (csvUnitsOption !== undefined && csvOption === undefined) throw new UsageError('--csv-units goes with --csv <file>');
    if (csvUnitsOption !== undefined && !['base', 'si', 'customary'].includes(csvUnitsOption)) throw new UsageError(`--csv-units: "${csvUnitsOption}" is not base, si or customary`);
    const csvUnits: CsvUnits = csvUnitsOption === 'si' || csvUnitsOption === 'customary' ? { display: csvUnitsOption } : {};
    const loaded = await loadVerbProject(file, optionalString(values, 'inlet'), io);
    if (typeof loaded === 'number') return loaded;
    const { project, input, deck } = loaded;
    const result = solveMission(input);
    const context = {
      projectName: project.name,
      inletName: input.propulsion.inletName,
      deckTitle: input.propulsion.label,
      parametricDeck: input.propulsion.parametric,
      installationMethod: input.propulsion.installationMethod,
      assumptions: installationAssumptions(project, deck.hasSensitivities).map((a) => a.text),
    };

    if (csvOption !== undefined) {
      const csvPath = resolve(io.cwd, csvOption);
      try {
        await writeFile(csvPath, historyCsv(result.history, csvUnits), 'utf8');
      } catch (e) {
        io.err(`blockwise fly: cannot write the time history to ${csvPath}: ${e instanceof Error ? e.message : String(e)}\n`);
        return 1;
      }
    }
    if (values.json === true) printJson(io, missionJson(result, context));
    else io.out(missionSummaryText(result, context));
    return missionExitCode(result.status);
  },
};
