import { describe, expect, it } from 'vitest';
import { VERB_CATALOGUE, type VerbName } from '../../../cli/verbs/catalogue';
import { isVerbName, VERB_LOADERS } from '../../../cli/verbs/loaders';
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

describe('cli/verbs/loaders.ts', () => {
  it('loads, for every catalogued verb, the very verb the full list registers under that name', async () => {
    for (const v of verbs) {
      const name = v.name as VerbName;
      expect(isVerbName(name)).toBe(true);
      expect(await VERB_LOADERS[name]()).toBe(v);
    }
    expect(Object.keys(VERB_LOADERS)).toHaveLength(verbs.length);
    expect(isVerbName('fyl')).toBe(false);
  });
});
