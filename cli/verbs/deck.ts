import { deckGridPoints, describeReferenceRecovery, type EngineDeck, lookupDeck, RATING_NAMES, type RatingName, ratingPower } from '../../engine/propulsion';
import { FOOT_M, POUND_FORCE_N, POUND_KG } from '../../engine/units';
import { significant } from '../common/numberText';
import { powerOrRating } from '../common/powerOption';
import { OPTION_RANGES, optionalQuantityOption, quantityOption } from '../common/quantityOptions';
import { printJsonReport, reportText } from '../common/report';
import { deckErrorsText, loadDeckFile, readDeckFile } from '../common/textFile';
import { requireString, UsageError, type Verb, stringOptions } from '../verb';
import { verbSummary } from './catalogue';

function onePositional(positionals: readonly string[]): string {
  if (positionals.length !== 1) throw new UsageError(`give exactly one deck file (got ${positionals.length})`);
  return positionals[0]!;
}

function round(x: number, digits = 6): number {
  return significant(x, digits);
}

interface DeckSummary {
  readonly title: string;
  readonly parametric: boolean;
  readonly referenceRecovery: string;
  readonly points: number;
  readonly nodes: number;
  readonly altitude_m: { readonly min: number; readonly max: number };
  readonly mach: { readonly min: number; readonly max: number };
  readonly power: { readonly min: number; readonly max: number };
  readonly isaDev_K: { readonly min: number; readonly max: number } | null;
  readonly hasAirflow: boolean;
  readonly hasSensitivities: boolean;
  readonly ratings: Readonly<Partial<Record<RatingName, number>>>;
  readonly policy: EngineDeck['policy'];
  readonly notes: readonly string[];
}

function range(values: ArrayLike<number>): { min: number; max: number } {
  let min = Infinity;
  let max = -Infinity;
  for (let i = 0; i < values.length; i++) {
    min = Math.min(min, values[i]!);
    max = Math.max(max, values[i]!);
  }
  return { min, max };
}

function summarize(deck: EngineDeck): DeckSummary {
  const g = deck.grid;
  return {
    title: deck.title,
    parametric: deck.parametric,
    referenceRecovery: describeReferenceRecovery(deck.referenceRecovery),
    points: deckGridPoints(g).length,
    nodes: g.machs.length,
    altitude_m: range(g.altitudes_m),
    mach: range(g.machs),
    power: range(g.power),
    isaDev_K: deck.hasIsaDev ? range(g.isaDevs_K) : null,
    hasAirflow: deck.hasAirflow,
    hasSensitivities: deck.hasSensitivities,
    ratings: deck.ratings,
    policy: deck.policy,
    notes: deck.notes,
  };
}

function summaryText(file: string, s: DeckSummary): string {
  const ratings = RATING_NAMES.filter((r) => s.ratings[r] !== undefined).map((r) => `${r} ${s.ratings[r]}`);
  const lines = [
    `Deck file ${file}: valid`,
    `  title               ${s.title}`,
    `  kind                ${s.parametric ? 'parametric (generated from a published model, not a maker\'s deck)' : 'tabulated'}`,
    `  reference recovery  ${s.referenceRecovery}`,
    `  points              ${s.points} at ${s.nodes} (altitude, Mach) nodes`,
    `  altitude            ${round(s.altitude_m.min / FOOT_M)} to ${round(s.altitude_m.max / FOOT_M)} ft (${round(s.altitude_m.min)} to ${round(s.altitude_m.max)} m)`,
    `  Mach                ${s.mach.min} to ${s.mach.max} (each altitude may have its own range)`,
    `  power               ${s.power.min} to ${s.power.max}`,
    `  ISA deviation       ${s.isaDev_K ? `${s.isaDev_K.min} to ${s.isaDev_K.max} K` : 'no axis (corrected-parameter approximation off ISA)'}`,
    `  airflow             ${s.hasAirflow ? 'tabulated' : 'not tabulated'}`,
    `  installation        ${s.hasSensitivities ? "the deck's sensitivity columns (recovery, bleed, extraction)" : "no sensitivity columns: Raymer's rule"}`,
    `  ratings             ${ratings.length ? ratings.join(', ') : 'none'}`,
    `  outside the table   altitude ${s.policy.altitude}, Mach ${s.policy.mach}, power ${s.policy.power}, ISA deviation ${s.policy.isaDev}`,
    ...s.notes.map((n, i) => `  ${i === 0 ? 'notes' : ''}`.padEnd(22) + n),
    '  values are per engine and uninstalled',
  ];
  return reportText(lines);
}

export const deckCheckVerb: Verb = {
  name: 'deck check',
  summary: verbSummary('deck check'),
  help: `blockwise deck check — validate an engine deck file and summarize it

Usage: blockwise deck check <file> [--json]

  <file>   deck CSV (name[unit] header, # metadata lines) or deck JSON (*.json);
           see docs/deck-format.md
  --json   print the summary (or the errors) as JSON

Exit status: 0 when the deck is valid; 1 with one line per error (line and
column) when it is not; 2 for a bad command line. A valid deck with values no
turbofan or turbojet gives (TSFC, thrust per airflow, fuel-air ratio at full
power) is still valid: each check prints one warning on stderr with the line,
and names a likely unit slip (e.g. fuel_flow in kg/min where lb/h was meant).
`,
  options: { json: { type: 'boolean' } },
  allowPositionals: true,
  run(values, positionals, io) {
    const file = onePositional(positionals);
    const result = readDeckFile(file, 'deck', io);
    if (result === null) return 1;
    if (!result.ok) {
      if (values.json === true) printJsonReport(io, { ok: false, file, errors: result.error });
      else io.err(deckErrorsText(file, result.error, `${result.error.length} error${result.error.length === 1 ? '' : 's'}; deck not loaded`));
      return 1;
    }
    const summary = summarize(result.value);
    const warnings = result.value.warnings ?? [];
    if (values.json === true) printJsonReport(io, { ok: true, file, ...summary, warnings });
    else {
      io.out(summaryText(file, summary));
      // Implausible values are warnings (the deck loads), on stderr so they are seen, each with its line.
      for (const w of warnings) io.err(`blockwise deck check: warning: ${file} ${w.message}\n`);
    }
    return 0;
  },
};

export const deckAtVerb: Verb = {
  name: 'deck at',
  summary: verbSummary('deck at'),
  help: `blockwise deck at — read an engine deck (per engine, uninstalled) at one point

Usage: blockwise deck at <file> --altitude <altitude> --mach <mach> --power <power|rating>
                         [--isa-dev <delta T>] [--json]

  --altitude   pressure altitude with unit, e.g. "35000 ft" or "10.7 km" (bare number: m)
  --mach       flight Mach number, e.g. 0.8
  --power      a number on the deck's power axis, or a rating name:
               ${RATING_NAMES.join(', ')}
  --isa-dev    ISA temperature deviation, e.g. "10 K" (default 0)
  --json       print the result as JSON (thrust_N, fuelFlow_kg_s, airflow_kg_s,
               power, outsideTable, cautions)

Off the table, each axis follows the deck's policy (extrapolate or clamp with a
caution, or refuse: exit 1).
`,
  options: {
    ...stringOptions('altitude', 'mach', 'power', 'isa-dev'),
    json: { type: 'boolean' },
  },
  allowPositionals: true,
  run(values, positionals, io) {
    const file = onePositional(positionals);
    const altitude_m = quantityOption(values, 'altitude', 'length', OPTION_RANGES.atmosphereAltitude);
    const mach = quantityOption(values, 'mach', 'dimensionless', OPTION_RANGES.mach);
    const isaDev_K = optionalQuantityOption(values, 'isa-dev', 'temperatureDelta', OPTION_RANGES.isaDeviation) ?? 0;
    const choice = powerOrRating(requireString(values, 'power'));
    const deck = loadDeckFile(file, 'deck', io);
    if (deck === null) return 1;
    let power: number;
    let rating: RatingName | null = null;
    if (choice.kind === 'rating') {
      const r = ratingPower(deck, choice.rating);
      if (!r.ok) {
        io.err(`blockwise deck at: --power: ${r.error.message}\n`);
        return 1;
      }
      power = r.value;
      rating = choice.rating;
    } else {
      power = choice.power;
    }
    const condition = { altitude_m, mach, isaDev_K };
    const looked = lookupDeck(deck, condition, power);
    if (!looked.ok) {
      if (values.json === true) printJsonReport(io, { ok: false, error: looked.error });
      else io.err(`blockwise deck at: ${looked.error.message}\n`);
      return 1;
    }
    const v = looked.value;
    const tsfc = v.thrust_N > 0 ? v.fuelFlow_kg_s / v.thrust_N : null;
    if (values.json === true) {
      printJsonReport(io, {
        ok: true,
        deck: deck.title,
        parametric: deck.parametric,
        perEngine: true,
        uninstalled: true,
        altitude_m,
        mach,
        isaDev_K,
        rating,
        power: v.power,
        thrust_N: v.thrust_N,
        fuelFlow_kg_s: v.fuelFlow_kg_s,
        airflow_kg_s: v.airflow_kg_s,
        sensitivities: v.sensitivities,
        tsfc_kg_N_s: tsfc,
        outsideTable: v.outside,
        cautions: v.cautions,
      });
      return 0;
    }
    const lbh = (kg_s: number): string => `${round((kg_s / POUND_KG) * 3600, 6)} lb/h`;
    const lines = [
      `${deck.title} — per engine, uninstalled (reference recovery ${describeReferenceRecovery(deck.referenceRecovery)})`,
      `  at ${round(altitude_m / FOOT_M)} ft (${round(altitude_m)} m), Mach ${mach}, ISA${isaDev_K >= 0 ? '+' : ''}${round(isaDev_K)} K, power ${round(v.power)}${rating ? ` (${rating})` : ''}`,
      `  thrust      ${round(v.thrust_N)} N   ${round(v.thrust_N / POUND_FORCE_N)} lbf`,
      `  fuel flow   ${round(v.fuelFlow_kg_s)} kg/s   ${lbh(v.fuelFlow_kg_s)}`,
      `  airflow     ${v.airflow_kg_s === null ? 'not tabulated' : `${round(v.airflow_kg_s)} kg/s   ${round(v.airflow_kg_s / POUND_KG)} lb/s`}`,
      `  TSFC        ${tsfc === null ? 'n/a (thrust not positive)' : `${round(tsfc * 1e6)} mg/(N s)   ${round((tsfc * 3600 * POUND_FORCE_N) / POUND_KG)} lb/(lbf h)`}`,
      `  table       ${v.outside.length === 0 ? 'inside' : `outside on ${v.outside.join(', ')}`}`,
      ...v.cautions.map((c) => `  ${c.severity}: ${c.message}`),
    ];
    io.out(reportText(lines));
    return 0;
  },
};
