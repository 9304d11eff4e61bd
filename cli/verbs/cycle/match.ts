/** `blockwise cycle match`: fit a cycle file's free parameters to a tabulated deck and print the residuals. */
import { existsSync, realpathSync } from 'node:fs';
import { resolve } from 'node:path';
import {
  cycleFileOf,
  DEFAULT_MATCH_FREE,
  DEFAULT_MATCH_NODES,
  DEFAULT_MATCH_RATINGS,
  deckWithCycleSensitivities,
  designEngine,
  MATCH_PARAMETERS,
  matchCycleToDeck,
  type CycleMatchResult,
  type DeckCopyCaution,
  type MatchParameter,
  type MatchPointResult,
} from '../../../engine/cycle/index';
import { CUSTOMARY_DECK_UNITS, deckToCsv, deckToJson, RATING_NAMES, SI_DECK_UNITS, type RatingName } from '../../../engine/propulsion';
import { SAFETY_NOTICE_LINES } from '../../../engine/core';
import { FOOT_M, groupDigits, POUND_KG } from '../../../engine/units';
import { EXIT_FILE, EXIT_NOT_SOLVED, EXIT_OK } from '../../exitCodes';
import { significant } from '../../common/numberText';
import { printJsonReport, reportText } from '../../common/report';
import { loadDeckFile } from '../../common/textFile';
import { optionalString, UsageError, type CliIo, type Verb, stringOptions } from '../../verb';
import { verbSummary } from '../catalogue';
import { writeAtomically } from './deck';
import { readDesignedCycle } from './readCycle';

const VERB = 'cycle match';

function nameList<T extends string>(values: Readonly<Record<string, unknown>>, option: string, allowed: readonly T[]): T[] | undefined {
  const text = optionalString(values, option);
  if (text === undefined) return undefined;
  const names = text.split(',').map((c) => c.trim()).filter((c) => c !== '');
  if (names.length === 0) throw new UsageError(`--${option}: give at least one name (${allowed.join(', ')})`);
  return names.map((n) => {
    const found = allowed.find((a) => a === n);
    if (found === undefined) throw new UsageError(`--${option}: "${n}" is not one of ${allowed.join(', ')}`);
    return found;
  });
}

function wholeNumber(values: Readonly<Record<string, unknown>>, option: string, min: number, max: number): number | undefined {
  const text = optionalString(values, option);
  if (text === undefined) return undefined;
  const n = Number(text);
  if (!Number.isInteger(n) || n < min || n > max) throw new UsageError(`--${option}: expected a whole number from ${min} to ${max} (got "${text}")`);
  return n;
}

function weightsOf(values: Readonly<Record<string, unknown>>): { thrust: number; fuelFlow: number } | undefined {
  const text = optionalString(values, 'weights');
  if (text === undefined) return undefined;
  const cells = text.split(',').map((c) => c.trim());
  const w = cells.map(Number);
  if (cells.length !== 2 || !w.every((v) => Number.isFinite(v) && v >= 0) || w[0]! + w[1]! === 0) {
    throw new UsageError(`--weights: expected two weights "THRUST,FUEL" of zero or more, not both zero (got "${text}")`);
  }
  return { thrust: w[0]!, fuelFlow: w[1]! };
}

/** "--bounds name=LO:HI,name=LO:HI" in SI (K, kg/s), e.g. "turbineInletTemperature=1100:1900". */
function boundsOf(values: Readonly<Record<string, unknown>>): Partial<Record<MatchParameter, readonly [number, number]>> | undefined {
  const text = optionalString(values, 'bounds');
  if (text === undefined) return undefined;
  const out: Partial<Record<MatchParameter, readonly [number, number]>> = {};
  for (const cell of text.split(',').map((c) => c.trim()).filter((c) => c !== '')) {
    const m = /^([A-Za-z]+)=([^:]+):(.+)$/.exec(cell);
    if (m === null) throw new UsageError(`--bounds: "${cell}" is not NAME=LOWER:UPPER`);
    const name = MATCH_PARAMETERS.find((p) => p === m[1]);
    if (name === undefined) throw new UsageError(`--bounds: "${m[1]}" is not one of ${MATCH_PARAMETERS.join(', ')}`);
    const lo = Number(m[2]);
    const hi = Number(m[3]);
    if (!(Number.isFinite(lo) && Number.isFinite(hi) && lo < hi)) throw new UsageError(`--bounds: ${name}: expected two finite numbers, lower below upper (got "${m[2]}:${m[3]}")`);
    out[name] = [lo, hi];
  }
  return out;
}

/** The real path of `path` when it exists, else the resolved path (so a symbolic link to the deck is caught too). */
function canonical(path: string): string {
  try {
    return existsSync(path) ? realpathSync(path) : path;
  } catch {
    return path;
  }
}

const pct = (r: number): string => `${significant(r * 100, 4)} %`;
const where = (p: MatchPointResult): string => `${groupDigits(Math.round(p.altitude_m / FOOT_M), 0)} ft, Mach ${p.mach}${p.isaDev_K !== 0 ? `, ISA${p.isaDev_K > 0 ? '+' : ''}${p.isaDev_K} K` : ''}, ${p.rating} (power ${p.power})`;
const QUANTITY = { thrust: 'thrust', fuelFlow: 'fuel flow' } as const;

function jsonOf(deckFile: string, startFile: string, out: string, deckOut: string | null, r: CycleMatchResult, deckOutCautions: readonly DeckCopyCaution[]): Record<string, unknown> {
  return {
    deck: deckFile,
    start: startFile,
    out,
    deckOut,
    status: r.status,
    message: r.message,
    rms: r.rms,
    rmsThrust: r.rmsThrust,
    rmsFuelFlow: r.rmsFuelFlow,
    worst: r.worst === null ? null : { ...r.worst.point, quantity: r.worst.quantity, residual: r.worst.residual },
    parameters: r.parameters,
    weights: r.weights,
    ratings: r.ratings,
    nodesUsed: r.nodesUsed,
    nodesInDeck: r.nodesInDeck,
    iterations: r.iterations,
    evaluations: r.evaluations,
    unmatched: r.unmatched,
    points: r.points,
    deckOutCautions,
  };
}

const PARAMETER_TEXT: Readonly<Record<MatchParameter, (v: number) => string>> = {
  bypassRatio: (v) => `bypass ratio              ${significant(v, 6)}`,
  fanPressureRatio: (v) => `fan pressure ratio        ${significant(v, 6)}`,
  overallPressureRatio: (v) => `overall pressure ratio    ${significant(v, 6)}`,
  turbineInletTemperature: (v) => `design Tt4                ${significant(v, 6)} K`,
  airflow: (v) => `design airflow            ${significant(v, 6)} kg/s (${significant(v / POUND_KG, 6)} lb/s)`,
  ratingTemperatureOffset: (v) => `rating Tt4 limit offset   ${significant(v, 4)} K`,
};

export const cycleMatchVerb: Verb = {
  name: VERB,
  summary: verbSummary(VERB),
  help: `blockwise cycle match — fit a cycle file to a tabulated deck (per engine)

Usage: blockwise cycle match <deck-file> --start <cycle-file> --out <cycle-file>
                             [--deck-out <deck.csv|deck.json>] [--free LIST]
                             [--ratings LIST] [--nodes N] [--weights THRUST,FUEL]
                             [--bounds NAME=LO:HI,...] [--iterations N]
                             [--units customary|si] [--digits N] [--json]

  <deck-file>    the deck to fit (CSV or JSON, docs/deck-format.md)
  --start        the starting cycle file (docs/cycle-format.md); its components,
                 gas, limits and ratings are kept
  --out          the fitted cycle file to write (sized by design airflow)
  --deck-out     also write a copy of the deck with installation-sensitivity
                 columns from the fitted cycle; the deck's own columns are
                 unchanged; never the deck file itself
  --free         parameters to fit, from ${MATCH_PARAMETERS.join(', ')}
                 (default ${DEFAULT_MATCH_FREE.join(', ')})
  --ratings      ratings to fit at, from ${RATING_NAMES.join(', ')}
                 (default ${DEFAULT_MATCH_RATINGS.join(', ')}; only those both files have)
  --nodes        most (altitude, Mach) nodes to use, taken evenly through the
                 deck's nodes (default ${DEFAULT_MATCH_NODES})
  --weights      weights of the relative thrust and fuel-flow residuals (default 1,1)
  --bounds       bounds of free parameters in SI (K, kg/s), e.g.
                 "turbineInletTemperature=1100:1900,airflow=80:160" (default: about
                 the start, docs/cycle.md); the start must lie inside
  --iterations   iteration limit of the least-squares fit (default 40)
  --units, --digits  units and significant digits of a CSV --deck-out (default customary, 7)
  --json         print the result as JSON (status, rms, worst, parameters, points, ...)

A deck point enters the fit at a rating: the deck's value at the rating's
power-axis value is compared with the cycle run at that rating. Residuals are
relative, (cycle - deck) / deck. Exit status: 0 converged and written; 3 the
fit did not converge or some points could not be matched (the fitted cycle is
still written, with the reason on stderr); 1 a file cannot be read, fitted or
written; 2 bad command line. Method: docs/cycle.md, "Matching a cycle to a deck".
`,
  options: {
    ...stringOptions('start', 'out', 'deck-out', 'free', 'ratings', 'nodes', 'weights', 'bounds', 'iterations', 'units', 'digits'),
    json: { type: 'boolean' },
  },
  allowPositionals: true,
  run(values, positionals, io: CliIo) {
    if (positionals.length !== 1) throw new UsageError(`give exactly one deck file (got ${positionals.length})`);
    const deckFile = positionals[0]!;
    const startFile = optionalString(values, 'start');
    if (startFile === undefined || startFile.trim() === '') throw new UsageError('missing --start (the starting cycle file)');
    const out = optionalString(values, 'out');
    if (out === undefined || out.trim() === '') throw new UsageError('missing --out (the fitted cycle file to write)');
    const deckOut = optionalString(values, 'deck-out');
    if (deckOut !== undefined && deckOut.trim() === '') throw new UsageError('--deck-out: give a file name');
    const deckPath = canonical(resolve(io.cwd, deckFile));
    const outPath = resolve(io.cwd, out);
    if (canonical(outPath) === deckPath) throw new UsageError(`--out: ${out} is the deck file itself; the deck is never overwritten`);
    if (canonical(outPath) === canonical(resolve(io.cwd, startFile))) throw new UsageError(`--out: ${out} is the starting cycle file; write the fitted cycle to a new file`);
    const deckOutPath = deckOut === undefined ? null : resolve(io.cwd, deckOut);
    if (deckOutPath !== null && canonical(deckOutPath) === deckPath) throw new UsageError(`--deck-out: ${deckOut} is the deck file itself; the deck copy goes to a new file`);
    if (deckOutPath !== null && deckOutPath === outPath) throw new UsageError('--deck-out and --out name the same file');
    const free = nameList(values, 'free', MATCH_PARAMETERS);
    const ratings = nameList(values, 'ratings', RATING_NAMES as readonly RatingName[]);
    const maxNodes = wholeNumber(values, 'nodes', 1, 10000);
    const maxIterations = wholeNumber(values, 'iterations', 1, 1000);
    const weights = weightsOf(values);
    const bounds = boundsOf(values);
    const units = optionalString(values, 'units') ?? 'customary';
    if (units !== 'customary' && units !== 'si') throw new UsageError(`--units: "${units}" is not customary or si`);
    const digits = wholeNumber(values, 'digits', 4, 17) ?? 7;

    const deck = loadDeckFile(deckFile, VERB, io);
    if (deck === null) return EXIT_FILE;
    const startEngine = readDesignedCycle(startFile, VERB, io);
    if (startEngine === null) return EXIT_FILE;
    const fit = matchCycleToDeck(deck, startEngine.spec, {
      ...(free ? { free } : {}),
      ...(ratings ? { ratings } : {}),
      ...(maxNodes !== undefined ? { maxNodes } : {}),
      ...(maxIterations !== undefined ? { maxIterations } : {}),
      ...(weights ? { weights } : {}),
      ...(bounds ? { bounds } : {}),
    });
    if (!fit.ok) {
      if (fit.error.code === 'invalid_options') throw new UsageError(fit.error.message);
      io.err(`blockwise ${VERB}: ${deckFile}: ${fit.error.message}\n`);
      return EXIT_FILE;
    }
    const r = fit.value;
    const notes = [
      `Fitted by blockwise cycle match to the deck ${deckFile} from the starting cycle ${startFile}: ${r.status} (${r.message}); RMS relative residual ${pct(r.rms)} over ${r.points.length - r.unmatched.length} rating points.`,
      `Free: ${MATCH_PARAMETERS.filter((p) => r.parameters[p].free).join(', ')}. Sized by design airflow.`,
      ...SAFETY_NOTICE_LINES,
    ];
    const spec = { ...r.spec, title: `${r.spec.title} (matched to ${deck.title})` };
    try {
      writeAtomically(outPath, `${JSON.stringify(cycleFileOf(spec, notes), null, 2)}\n`);
    } catch (e) {
      io.err(`blockwise ${VERB}: cannot write ${outPath}: ${e instanceof Error ? e.message : String(e)}\n`);
      return EXIT_FILE;
    }
    let copyCautions: readonly DeckCopyCaution[] = [];
    if (deckOutPath !== null) {
      const engine = designEngine(r.spec);
      const copy = engine.ok ? deckWithCycleSensitivities(deck, engine.value) : null;
      if (copy === null || !copy.ok) {
        io.err(`blockwise ${VERB}: no deck copy written: ${copy === null ? 'the fitted cycle cannot be designed' : copy.error.message}\n`);
        return EXIT_FILE;
      }
      copyCautions = copy.value.cautions;
      const head = [
        `## Copy of ${deckFile} with installation-sensitivity columns from the cycle fitted by blockwise cycle match (${out}); thrust, fuel flow and airflow are the deck's own.`,
        ...SAFETY_NOTICE_LINES.map((l) => `## ${l}`),
      ].join('\n');
      const text = deckOutPath.toLowerCase().endsWith('.json') ? deckToJson(copy.value.deck) : `${head}\n${deckToCsv(copy.value.deck, units === 'si' ? SI_DECK_UNITS : CUSTOMARY_DECK_UNITS, digits)}`;
      try {
        writeAtomically(deckOutPath, text);
      } catch (e) {
        io.err(`blockwise ${VERB}: cannot write ${deckOutPath}: ${e instanceof Error ? e.message : String(e)}\n`);
        return EXIT_FILE;
      }
    }
    const code = r.status === 'converged' ? EXIT_OK : EXIT_NOT_SOLVED;
    if (code !== EXIT_OK) io.err(`blockwise ${VERB}: ${r.message}\n`);
    if (values.json === true) {
      printJsonReport(io, jsonOf(deckFile, startFile, outPath, deckOutPath, r, copyCautions));
      return code;
    }
    const lines = [
      `Cycle matched to "${deck.title}": ${r.status} (${r.message}), ${r.iterations} iterations, ${r.evaluations} evaluations`,
      `  points      ${r.points.length} at ${r.ratings.join(', ')} over ${r.nodesUsed} of ${r.nodesInDeck} nodes; weights thrust ${r.weights.thrust}, fuel flow ${r.weights.fuelFlow}`,
      `  residuals   RMS ${pct(r.rms)} (thrust ${pct(r.rmsThrust)}, fuel flow ${pct(r.rmsFuelFlow)}), relative (cycle - deck) / deck`,
      r.worst === null ? '  worst       none (no point matched)' : `  worst       ${QUANTITY[r.worst.quantity]} ${pct(r.worst.residual)} at ${where(r.worst.point)}`,
      ...r.unmatched.slice(0, 10).map((p) => `  unmatched   ${where(p)}: ${p.reason}`),
      '  parameters (start -> fitted):',
      ...MATCH_PARAMETERS.filter((p) => r.parameters[p].free).map((p) => {
        const v = r.parameters[p];
        return `    ${PARAMETER_TEXT[p](v.fitted)}   (start ${significant(v.start, 6)}${v.atBound ? `; CAUTION: on its bound ${significant(v.lower, 6)} to ${significant(v.upper, 6)}` : ''})`;
      }),
      `  written     ${outPath}${deckOutPath !== null ? `; deck copy with sensitivities ${deckOutPath}${copyCautions.length > 0 ? ` (${copyCautions.length} point(s) outside the cycle's idle-to-takeoff thrust took the end's sensitivities)` : ''}` : ''}`,
    ];
    io.out(reportText(lines));
    return code;
  },
};
