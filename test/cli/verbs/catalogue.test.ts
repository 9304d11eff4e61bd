import { describe, expect, it } from 'vitest';
import { VERB_CATALOGUE } from '../../../cli/verbs/catalogue';
import { verbs } from '../../../cli/verbs/index';
import { run } from '../support/cliRun';

// The overview prints from the catalogue without loading the verbs; the
// catalogue and the verbs themselves must list the same verbs in the same order.

describe('cli/verbs/catalogue.ts', () => {
  it('VERB_CATALOGUE lists every registered verb, in order, with the summary the verb carries', () => {
    expect(VERB_CATALOGUE.map((v) => [v.name, v.summary])).toEqual(verbs.map((v) => [v.name, v.summary]));
    for (const v of verbs) expect(v.summary.length).toBeGreaterThan(10);
  });

  it('blockwise --help lists each catalogued verb with its summary', async () => {
    const help = await run('--help');
    expect(help.code).toBe(0);
    for (const v of VERB_CATALOGUE) expect(help.out).toContain(`${v.name}`);
    for (const v of VERB_CATALOGUE) expect(help.out).toContain(v.summary);
  });
});
