import { DEFAULT_CAUTION_SETTINGS } from '../../engine/cautions';
import { describeInstallationMethod, describeReferenceRecovery, type EngineDeck, type InletDesign, type InstallationSettings, installedLossBreakdown, type InstalledLossBreakdown, type InstalledPoint, makeInstalledPropulsion, RATING_NAMES, validateInletDesign, validateInstallation } from '../../engine/propulsion';
import { fromZodIssues, inletDesignOf, inletSchema, parseJsonText } from '../../engine/project';
import { FOOT_M } from '../../engine/units';
import { significant } from '../common/numberText';
import { powerOrRating } from '../common/powerOption';
import { OPTION_RANGES, optionalQuantityOption, quantityOption } from '../common/quantityOptions';
import { printJsonReport, reportText } from '../common/report';
import { loadDeckFile, readTextFile } from '../common/textFile';
import { optionalString, UsageError, type CliIo, type Verb, stringOptions } from '../verb';
import { verbSummary } from './catalogue';

/**
 * The inlet designs in a design file: one inlet object, an array of them, or
 * a project file (its `inlets`). Each is checked with the project's inlet
 * schema (units allowed) and the engine's validator; errors name the file
 * and the JSON path.
 */
function readDesigns(file: string, io: CliIo): InletDesign[] | null {
  const text = readTextFile(file, 'inlet', io);
  if (text === null) return null;
  const parsed = parseJsonText(text);
  if (!parsed.ok) {
    io.err(`${file}: ${parsed.error.message}\n`);
    return null;
  }
  const doc = parsed.value;
  let entries: unknown[];
  let prefix: (i: number) => string;
  if (Array.isArray(doc)) {
    entries = doc;
    prefix = (i) => `[${i}]`;
  } else if (doc !== null && typeof doc === 'object' && Array.isArray((doc as { inlets?: unknown }).inlets)) {
    entries = (doc as { inlets: unknown[] }).inlets;
    prefix = (i) => `inlets[${i}]`;
  } else {
    entries = [doc];
    prefix = () => '';
  }
  if (entries.length === 0) {
    io.err(`${file}: no inlet designs found (expected an inlet object, an array of them, or a project file with "inlets")\n`);
    return null;
  }
  const designs: InletDesign[] = [];
  const errors: string[] = [];
  entries.forEach((entry, i) => {
    const at = prefix(i);
    const join = (path: string): string => (at === '' ? path : path === '(file)' ? at : `${at}.${path}`);
    const checked = inletSchema.safeParse(entry);
    if (!checked.success) {
      for (const issue of fromZodIssues(checked.error.issues, entry)) {
        errors.push(`${file}: ${join(issue.path)}: ${issue.message}`);
      }
      return;
    }
    const design = inletDesignOf(checked.data);
    const issues = validateInletDesign(design);
    if (issues.length > 0) {
      for (const issue of issues) errors.push(`${file}: ${join(issue.path)}: ${issue.message}`);
      return;
    }
    designs.push(design);
  });
  if (errors.length > 0) {
    io.err(`${errors.join('\n')}\n${file}: ${errors.length} error${errors.length === 1 ? '' : 's'}; inlet designs not loaded\n`);
    return null;
  }
  return designs;
}

function round(x: number, digits = 5): number {
  return significant(x, digits);
}

function fixed(x: number | null, digits: number): string {
  return x === null ? '-' : x.toFixed(digits);
}

interface DesignResult {
  readonly design: InletDesign;
  readonly point: InstalledPoint;
  readonly loss: InstalledLossBreakdown;
}

function table(rows: readonly (readonly string[])[]): string[] {
  const widths = rows[0]!.map((_, c) => Math.max(...rows.map((r) => r[c]!.length)));
  return rows.map((r) => `  ${r.map((cell, c) => (c === 0 ? cell.padEnd(widths[c]!) : cell.padStart(widths[c]!))).join('   ')}`);
}

function textReport(deck: EngineDeck, results: readonly DesignResult[], engineCount: number, what: string): string {
  const r0 = results[0]!.point;
  const col = (f: (r: DesignResult) => string): string[] => results.map(f);
  const rows: string[][] = [
    ['per engine', ...col((r) => r.design.name)],
    [`recovery (deck reference ${describeReferenceRecovery(deck.referenceRecovery)})`, ...col((r) => fixed(r.point.perEngine.recovery, 4))],
    ['mass-flow ratio A0/Ac', ...col((r) => fixed(r.point.perEngine.massFlowRatio, 3))],
    ['throat Mach', ...col((r) => fixed(r.point.perEngine.throatMach, 3))],
    ['fan-face Mach', ...col((r) => fixed(r.point.perEngine.fanFaceMach, 3))],
    ['uninstalled thrust (N)', ...col((r) => fixed(r.point.perEngine.uninstalledThrust_N, 0))],
    ['  less recovery loss (N)', ...col((r) => fixed(r.loss.recoveryLoss_N, 0))],
    ['  less bleed loss (N)', ...col((r) => fixed(r.loss.bleedLoss_N, 0))],
    ['  less extraction loss (N)', ...col((r) => fixed(r.loss.extractionLoss_N, 0))],
    ['  less spillage drag (N)', ...col((r) => fixed(r.loss.spillage_N, 0))],
    ['installed thrust (N)', ...col((r) => fixed(r.point.perEngine.thrust_N, 0))],
    ['fuel flow (kg/h)', ...col((r) => fixed(r.point.perEngine.fuelFlow_kg_s * 3600, 1))],
    ['airframe: external drag D/q, all engines (m2)', ...col((r) => fixed(r.design.externalDragArea_m2 * engineCount, 3))],
    ['airframe: inlet weight, all engines (kg)', ...col((r) => fixed(r.design.weight_kg * engineCount, 0))],
  ];
  const lines = [
    `${deck.title} — installed, ${engineCount} engine${engineCount === 1 ? '' : 's'}`,
    `  at ${round(r0.altitude_m / FOOT_M)} ft (${round(r0.altitude_m)} m), Mach ${r0.mach}, ISA${r0.isaDev_K >= 0 ? '+' : ''}${round(r0.isaDev_K)} K, ${what}`,
    `  installation method: ${describeInstallationMethod(r0.perEngine.installationMethod)}`,
    ...table(rows),
  ];
  if (results.length >= 2) {
    const [a, b] = results as [DesignResult, DesignResult];
    const d = b.point.perEngine.thrust_N - a.point.perEngine.thrust_N;
    const part = (x: number): string => `${x >= 0 ? '+' : ''}${x.toFixed(0)} N`;
    lines.push(
      `  "${b.design.name}" minus "${a.design.name}": installed thrust ${part(d)} per engine = ` +
        `recovery ${part(a.loss.recoveryLoss_N - b.loss.recoveryLoss_N)}, spillage ${part(a.loss.spillage_N - b.loss.spillage_N)}, ` +
        `bleed and extraction ${part(a.loss.bleedLoss_N + a.loss.extractionLoss_N - b.loss.bleedLoss_N - b.loss.extractionLoss_N)}`,
    );
  }
  for (const r of results) {
    for (const c of r.point.cautions) lines.push(`  ${c.severity} (${r.design.name}): ${c.message}`);
  }
  lines.push('  thrust is net of spillage drag; external drag and weight are airframe items (docs/installation.md)');
  return reportText(lines);
}

export const inletVerb: Verb = {
  name: 'inlet',
  summary: verbSummary('inlet'),
  help: `blockwise inlet — installed thrust of an engine deck behind inlet designs, with the loss breakdown

Usage: blockwise inlet <deck file> --design <file> [--design <file> ...]
                       --altitude <altitude> --mach <mach> [--power <power|rating>]
                       [--isa-dev <delta T>] [--engines <n>] [--bleed <fraction>]
                       [--extraction <power>] [--json]

  <deck file>    engine deck CSV or JSON (per engine, uninstalled)
  --design       a JSON file with one inlet design (as in a project's "inlets"
                 list, units allowed), an array of them, or a project file
                 (all its inlets); repeat to compare files
  --altitude     pressure altitude with unit, e.g. "35000 ft" (bare number: m)
  --mach         flight Mach number
  --power        a power-axis value or a rating (${RATING_NAMES.join(', ')});
                 default maxCruise
  --isa-dev      ISA temperature deviation, e.g. "10 K" (default 0)
  --engines      engine count (default 2)
  --bleed        customer bleed as a fraction of core flow, e.g. 0.015 or "1.5 %" (default 0)
  --extraction   shaft power extracted per engine, e.g. "30 kW" (default 0)
  --json         print the points and breakdowns as JSON

Each design's recovery, mass-flow ratio, throat and fan-face Mach, thrust
losses (recovery, bleed, extraction, spillage) and installed thrust are shown
side by side. Recovery, bleed and extraction act through the deck's
installation sensitivities when it carries them, else by Raymer's rule; the
report names which; with two or more designs, the thrust difference of the second
against the first is split into its parts. Methods: docs/installation.md.
`,
  options: {
    design: { type: 'string', multiple: true },
    ...stringOptions('altitude', 'mach', 'power', 'isa-dev', 'engines', 'bleed', 'extraction'),
    json: { type: 'boolean' },
  },
  allowPositionals: true,
  run(values, positionals, io) {
    if (positionals.length !== 1) throw new UsageError(`give exactly one deck file (got ${positionals.length})`);
    const deckFile = positionals[0]!;
    const designFiles = (Array.isArray(values.design) ? values.design : []).filter((v): v is string => typeof v === 'string');
    if (designFiles.length === 0) throw new UsageError('missing --design (an inlet design JSON file)');
    const altitude_m = quantityOption(values, 'altitude', 'length', OPTION_RANGES.flightAltitude);
    const mach = quantityOption(values, 'mach', 'dimensionless', OPTION_RANGES.mach);
    if (!(mach >= 0) || mach > 5) throw new UsageError(`--mach: expected a Mach number from 0 to 5 (got ${String(values.mach)})`);
    const isaDev_K = optionalQuantityOption(values, 'isa-dev', 'temperatureDelta', OPTION_RANGES.isaDeviation) ?? 0;
    const enginesText = optionalString(values, 'engines') ?? '2';
    const engineCount = Number(enginesText);
    if (!Number.isInteger(engineCount) || engineCount < 1 || engineCount > 8) {
      throw new UsageError(`--engines: expected a whole number from 1 to 8 (got "${enginesText}")`);
    }
    const bleed = optionalQuantityOption(values, 'bleed', 'dimensionless', OPTION_RANGES.fraction) ?? 0;
    const extraction_W = optionalQuantityOption(values, 'extraction', 'power', OPTION_RANGES.shaftPower) ?? 0;
    const installation: InstallationSettings = { bleed: { kind: 'coreFraction', fraction: bleed }, powerExtraction_W: extraction_W };
    const deck = loadDeckFile(deckFile, 'inlet', io);
    if (deck === null) return 1;
    const installIssues = validateInstallation(installation, deck.hasAirflow);
    if (installIssues.length > 0) {
      const byOption: Record<string, string> = { 'bleed.fraction': '--bleed', powerExtraction_W: '--extraction' };
      throw new UsageError(installIssues.map((i) => `${byOption[i.path] ?? i.path}: ${i.message}`).join('; '));
    }
    const designs: InletDesign[] = [];
    for (const file of designFiles) {
      const read = readDesigns(file, io);
      if (read === null) return 1;
      designs.push(...read);
    }
    const choice = powerOrRating(optionalString(values, 'power') ?? 'maxCruise');
    const rating = choice.kind === 'rating' ? choice.rating : undefined;
    const power = choice.kind === 'power' ? choice.power : null;
    const condition = { altitude_m, mach, isaDev_K };
    const results: DesignResult[] = designs.map((design) => {
      const model = makeInstalledPropulsion({ deck, engineCount, inlet: design, installation, cautionSettings: DEFAULT_CAUTION_SETTINGS });
      const point = rating !== undefined ? model.atRating(condition, rating) : model.atPower(condition, power!);
      return { design, point, loss: installedLossBreakdown(point.perEngine) };
    });
    const what = rating !== undefined ? `${rating} (power ${round(results[0]!.point.power)})` : `power ${round(power!)}`;
    if (values.json === true) {
      printJsonReport(io, {
        ok: true,
        deck: deck.title,
        parametric: deck.parametric,
        referenceRecovery: describeReferenceRecovery(deck.referenceRecovery),
        installationMethod: results[0]!.point.perEngine.installationMethod,
        engineCount,
        condition,
        rating: rating ?? null,
        installation,
        designs: results.map((r) => ({ design: r.design, point: r.point, lossPerEngine: r.loss })),
      });
      return 0;
    }
    io.out(textReport(deck, results, engineCount, what));
    return 0;
  },
};
