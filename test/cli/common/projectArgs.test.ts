import { describe, expect, it } from 'vitest';
import { loadVerbProject, projectArgument } from '../../../cli/common/projectArgs';
import { UsageError } from '../../../cli/verb';
import { DEMO_PROJECT, repoRoot } from '../support/cliRun';

function io() {
  const seen = { out: '', err: '' };
  return { seen, cli: { out: (t: string) => (seen.out += t), err: (t: string) => (seen.err += t), cwd: repoRoot } };
}

describe('projectArgument', () => {
  it('projectArgument takes exactly one project file', () => {
    expect(projectArgument(['a.blockwise.json'], 'fly')).toBe('a.blockwise.json');
    expect(() => projectArgument([], 'trade')).toThrow(new UsageError('missing the project file: blockwise trade <project.blockwise.json>'));
    expect(() => projectArgument(['a', 'b'], 'fly')).toThrow(/one project file at a time \(got 2: a, b\)/);
  });
});

describe('loadVerbProject', () => {
  it('loadVerbProject builds the mission input for the named inlet', async () => {
    const { cli, seen } = io();
    const loaded = await loadVerbProject(DEMO_PROJECT, 'short', cli);
    if (typeof loaded === 'number') throw new Error(seen.err);
    expect(loaded.input.propulsion.inletName).toBe('short');
    expect(loaded.project.inlets.map((i) => i.name)).toContain('short');
  });

  it('loadVerbProject refuses an inlet the project does not have, listing its designs', async () => {
    const { cli } = io();
    await expect(loadVerbProject(DEMO_PROJECT, 'scoop', cli)).rejects.toThrow(/"scoop" is not an inlet design .* it has "long pitot", "short"/);
    await expect(loadVerbProject(DEMO_PROJECT, ' ', cli)).rejects.toThrow('--inlet: give the name of an inlet design');
    await expect(loadVerbProject(DEMO_PROJECT, 'scoop', cli, '--inlets')).rejects.toThrow(/^--inlets: "scoop"/);
  });

  it('loadVerbProject prints why a project cannot be read and returns exit code 1', async () => {
    const { cli, seen } = io();
    expect(await loadVerbProject('fixtures/no-such.blockwise.json', undefined, cli)).toBe(1);
    expect(seen.err).toContain('no-such.blockwise.json');
    expect(seen.err).toContain('no such file');
  });
});
