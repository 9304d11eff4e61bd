/**
 * The verbs in the order `blockwise --help` lists them, with their one-line
 * summaries. Kept apart from the verb modules so that the overview prints
 * without loading any verb (and the engine behind it): the CLI's start-up.
 * Each verb module takes its summary from here; `cli/verbs/index.ts` lists
 * the verbs themselves in the same order (a test checks both agree).
 */
export const VERB_CATALOGUE = [
  { name: 'fly', summary: 'fly a project\'s mission and print block fuel, time, reserves, legs and cautions' },
  { name: 'air', summary: 'standard atmosphere and airspeeds at a pressure altitude' },
  { name: 'deck check', summary: 'validate an engine deck file (CSV or JSON) and summarize it' },
  { name: 'deck at', summary: 'read an engine deck at an altitude, Mach and power setting' },
  { name: 'inlet', summary: 'install an engine deck behind one or more inlet designs and show why they differ' },
  { name: 'crossover', summary: 'thrust available vs drag over Mach at an altitude and weight: the crossover Machs' },
  { name: 'envelope', summary: 'level-flight envelope over altitude and the absolute, service and cruise ceilings' },
  { name: 'range-speeds', summary: 'specific range over Mach, maximum-range and long-range Mach, and the optimum altitude' },
  { name: 'payload-range', summary: 'payload-range diagram: corner points and the curve, each a mission with reserves' },
  { name: 'compare', summary: 'inlet A vs inlet B on the same mission, with the block-fuel difference broken down' },
  { name: 'trade', summary: 'trade factors: block fuel per 1 % recovery, per drag count, per 1 % TSFC, per 100 kg OEW' },
  { name: 'sweep', summary: 'fly every combination of varied project fields over all cores, one row per case (CSV or JSON lines)' },
  { name: 'uncertainty', summary: 'block fuel with its uncertainty band: a seeded Monte Carlo of the declared uncertain inputs' },
  { name: 'cycle point', summary: 'run an engine cycle file at one flight condition and throttle' },
  { name: 'cycle deck', summary: 'write the deck of a cycle file, with airflow and installation-sensitivity columns' },
  { name: 'cycle match', summary: 'fit a cycle file to a tabulated deck\'s thrust and fuel flow at its ratings and print the residuals' },
] as const satisfies readonly { readonly name: string; readonly summary: string }[];

export type VerbName = (typeof VERB_CATALOGUE)[number]['name'];

/** The one-line summary of a catalogued verb. */
export function verbSummary(name: VerbName): string {
  return VERB_CATALOGUE.find((v) => v.name === name)?.summary ?? '';
}
