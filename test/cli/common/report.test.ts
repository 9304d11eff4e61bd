import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { analysisFailed, cautionBlock, EXIT_ANALYSIS_FAILED, isaText, printJsonReport, reportText } from '../../../cli/common/report';
import { verbs } from '../../../cli/verbs/index';
import type { Caution } from '../../../engine/cautions/caution';
import { SAFETY_NOTICE, SAFETY_NOTICE_LINES } from '../../../engine/core/notice';
import { DEMO_DECK, DEMO_PROJECT, run, type Json, shortDemoForSuite } from '../support/cliRun';

// The notice every summary carries is a product rule (DESIGN.md §7), not a computed value:
// the checks below hold the command line to it.
const NOTICE_ENDING = `\n\n${SAFETY_NOTICE_LINES.join('\n')}\n`;

function capture() {
  const io = { out: '', err: '' };
  return { io, cli: { out: (t: string) => (io.out += t), err: (t: string) => (io.err += t), cwd: '/' } };
}

describe('reportText', () => {
  it('reportText ends the lines with a blank line, the notice lines and a newline', () => {
    expect(reportText(['a', 'b'])).toBe(`a\nb${NOTICE_ENDING}`);
  });
});

describe('printJsonReport', () => {
  it('printJsonReport adds notice as the last key and keeps the others', () => {
    const { io, cli } = capture();
    printJsonReport(cli, { a: 1, b: 'x' });
    const doc = JSON.parse(io.out) as Json;
    expect(Object.keys(doc)).toEqual(['a', 'b', 'notice']);
    expect(doc.notice).toBe(SAFETY_NOTICE);
  });
});

describe('cautionBlock', () => {
  it('cautionBlock is empty without cautions and lists severity, id and message otherwise', () => {
    expect(cautionBlock([])).toEqual([]);
    const c = { id: 'mmo', severity: 'warning', message: 'Mach 0.9 above MMO' } as unknown as Caution;
    expect(cautionBlock([c])).toEqual(['', 'Cautions:', '  [warning] mmo: Mach 0.9 above MMO']);
  });
});

describe('analysisFailed and isaText', () => {
  it('analysisFailed prints the verb and message on stderr and returns exit code 3', () => {
    const { io, cli } = capture();
    expect(analysisFailed(cli, 'trade', 'the design mission failed')).toBe(EXIT_ANALYSIS_FAILED);
    expect(EXIT_ANALYSIS_FAILED).toBe(3);
    expect(io.err).toBe('blockwise trade: the design mission failed\n');
    expect(io.out).toBe('');
  });

  it('isaText signs the deviation with one decimal', () => {
    expect(isaText(0)).toBe('ISA+0.0 K');
    expect(isaText(10)).toBe('ISA+10.0 K');
    expect(isaText(-5.25)).toBe('ISA-5.3 K');
  });
});

// Every registered verb, run on the demo files (the missions on a short copy of the demo so the
// 16-mission comparison and the trade factors stay light). A verb added to cli/verbs/index.ts
// without an entry here fails the first test.
const demo = shortDemoForSuite('blockwise-notice-', '600 nmi');

const ARGUMENTS: Readonly<Record<string, (project: string) => string[]>> = {
  fly: (p) => ['fly', p],
  air: () => ['air', '--altitude', '35000 ft', '--mach', '0.78'],
  'deck check': () => ['deck', 'check', DEMO_DECK],
  'deck at': () => ['deck', 'at', DEMO_DECK, '--altitude', '35000 ft', '--mach', '0.78', '--power', 'maxCruise'],
  inlet: () => ['inlet', DEMO_DECK, '--design', DEMO_PROJECT, '--altitude', '35000 ft', '--mach', '0.78'],
  crossover: () => ['crossover', DEMO_PROJECT, '--altitude', '41000 ft', '--weight', '15000 kg'],
  envelope: () => ['envelope', DEMO_PROJECT, '--top', '45000 ft', '--step', '5000 ft'],
  'range-speeds': () => ['range-speeds', DEMO_PROJECT, '--altitude', '37000 ft', '--weight', '14000 kg'],
  'payload-range': (p) => ['payload-range', p, '--between', '0'],
  compare: (p) => ['compare', p],
  trade: (p) => ['trade', p],
  uncertainty: (p) => ['uncertainty', p, '--samples', '3'],
  sweep: (p) => ['sweep', p, '--vary', 'polar.cdIncrement=0:0.0001:0.0001', '--workers', '1', '--out', join(demo.dir(), 'sweep.csv')],
  'cycle point': () => ['cycle', 'point', 'fixtures/cycle/demo-turbofan.cycle.json', '--altitude', '35000 ft', '--mach', '0.78', '--rating', 'maxCruise'],
  'cycle deck': () => ['cycle', 'deck', 'fixtures/cycle/demo-turbofan.cycle.json', '--out', join(demo.dir(), 'cycle.deck.csv'), '--altitudes', '0, 35000 ft', '--machs', '0, 0.8'],
  'cycle match': () => ['cycle', 'match', 'fixtures/parametric/demo-parametric.deck.csv', '--start', 'fixtures/cycle/demo-turbofan.cycle.json', '--out', join(demo.dir(), 'match.cycle.json'), '--free', 'airflow', '--nodes', '2'],
};

describe('every verb ends with the safety notice', () => {
  it('the notice check has command-line arguments for every registered verb', () => {
    expect(verbs.map((v) => v.name).sort()).toEqual(Object.keys(ARGUMENTS).sort());
  });

  it.each(verbs.map((v) => v.name))('blockwise %s prints text ending with the notice and JSON carrying it', async (name) => {
    const argv = ARGUMENTS[name]!(demo.project());
    const text = await run(...argv);
    expect(text.err, `${name} stderr`).toBe('');
    expect(text.code, `${name} exit code`).toBe(0);
    expect(text.out.endsWith(NOTICE_ENDING), `${name} text ends with the notice`).toBe(true);
    const json = await run(...argv, '--json');
    expect(json.code, `${name} --json exit code`).toBe(0);
    const doc = JSON.parse(json.out) as Json;
    expect(doc.notice, `${name} --json notice`).toBe(SAFETY_NOTICE);
  }, 120_000);
});
