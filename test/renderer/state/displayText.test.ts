import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import * as checks from '../../../engine/cautions/checks';
import type { Caution } from '../../../engine/cautions/caution';
import { parseProject, parseProjectData } from '../../../engine/project/parseProject';
import { makeIssue } from '../../../engine/project/projectIssue';
import { msg, q } from '../../../engine/units/messageParts';
import { cautionText, codeWords, issueReason, pathLabel, ratingLabel, statusLabel } from '../../../renderer/state/displayText';
import { RATING_NAMES } from '../../../engine/propulsion/propulsionModel';

// The dom test environment has its own URL, so fixtures are found from the working directory (the repository root).
const fixturesDir = join(process.cwd(), 'fixtures');
const fixture = (path: string): string => readFileSync(join(fixturesDir, path), 'utf8');

/** An SI unit after a number ("1,524 m", "565 N", "13.4 m/s", "22362.1 kg", "-25 K" is allowed: ISA deviations read K in both systems). */
const SI_AFTER_NUMBER = /\d\s?(m|km|kg|N|kN|m\/s|Pa|hPa|kg\/h|kg\/s|m2)(?![\w/])/;
/** Float noise: more than four decimals. */
const FLOAT_NOISE = /\d\.\d{5,}/;

function expectCustomaryText(text: string): void {
  expect(text, text).not.toMatch(SI_AFTER_NUMBER);
  expect(text, text).not.toMatch(FLOAT_NOISE);
}

/** Every mission caution check, each given values that fire it (checks fire strictly beyond the threshold). */
function everyCheckedCaution(): Caution[] {
  const fired = [
    checks.checkVmo(150.123456, 140.5, 2.2),
    checks.checkMmo(0.8712345, 0.85, 0.01),
    checks.checkClMax(1.4123456, 1.33),
    checks.checkBuffetMargin(1.21234, 1.3),
    checks.checkResidualClimb(0.9123456, 1.524),
    checks.checkMtow(22362.123456, 21000.5),
    checks.checkMlw(13154.178730000001, 12000),
    checks.checkMzfw(22362.1, 9752.2),
    checks.checkFuelCapacity(6000.25, 5000),
    checks.checkReserve(300.33333, 900.5, 1),
    checks.checkThroatMach(0.8512345, 0.8),
    checks.checkThrustBelowDrag(565.4321, 612.98765),
    checks.checkPolarClamped(['cd0']),
    checks.idleAboveDragCaution(8000.1234, 9000.9876),
  ];
  return fired.map((c) => {
    expect(c).not.toBeNull();
    return c!;
  });
}

describe('displayText', () => {
  it('cautionText renders every mission caution check in customary units with no SI unit and no float noise', () => {
    const cautions = everyCheckedCaution();
    // Every exported check is exercised (a new check must be added to the list above).
    const exported = Object.values(checks).filter((f) => typeof f === 'function');
    expect(cautions.length).toBe(exported.length);
    for (const c of cautions) expectCustomaryText(cautionText(c, 'customary'));
    // The same caution in SI reads SI units: 22,362 kg (the MZFW check's mass to 0 decimals).
    expect(cautionText(checks.checkMzfw(22362.1, 9752.2)!, 'si')).toContain('22,362 kg');
    // 22,362.1 kg = 49,300 lb (1 lb = 0.45359237 kg exactly, NIST SP 811).
    expect(cautionText(checks.checkMzfw(22362.1, 9752.2)!, 'customary')).toContain('49,300 lb');
  });

  it('issueReason renders every bad-project fixture and every cross-field rule in customary units with no SI unit and no float noise', () => {
    const files = readdirSync(join(fixturesDir, 'bad-projects')).filter((f) => f.endsWith('.blockwise.json'));
    expect(files.length).toBeGreaterThan(10);
    let seen = 0;
    for (const f of files) {
      const r = parseProject(fixture(`bad-projects/${f}`), f);
      if (r.ok) continue;
      for (const issue of r.error) {
        seen++;
        // The file's own text is quoted as written ("35000 furlongs"); what the screen adds is customary.
        const reason = issueReason(issue, 'customary').replace(/"[^"]*"/g, '"…"');
        expectCustomaryText(`${pathLabel(issue.path)}: ${reason}`);
      }
    }
    expect(seen).toBeGreaterThan(10);
  });

  it('issueReason shows a value the renderer wrote in SI (out of range) in the chosen units', () => {
    const demo = JSON.parse(fixture('demo/demo.blockwise.json')) as { mission: { wind?: unknown } };
    demo.mission.wind = -160.72222222222223;
    const r = parseProjectData(demo);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const issue = r.error.find((i) => i.path === 'mission.wind')!;
    const text = issueReason(issue, 'customary');
    // -160.72 m/s = -312 kt (1 kt = 1852/3600 m/s exactly, NIST SP 811); bounds +-150 m/s = 292 kt.
    expect(text).toContain('-312 kt');
    expect(text).toContain('292 kt');
    expectCustomaryText(text);
  });

  it('issueReason rounds float noise in a plain-text reason', () => {
    const issue = makeIssue('mission.legs[1].altitude', '1', 'x', 'value 13154.178730000001 is odd');
    expect(issueReason(issue, 'customary')).toBe('value 13,154.2 is odd');
    const withParts = makeIssue('airframe.weights.maxZeroFuel', '1', 'x', msg`zero-fuel ${q(22362.1, 'mass')}`);
    expect(issueReason(withParts, 'customary')).toBe('zero-fuel 49,300 lb');
  });

  it('pathLabel numbers legs from 1 as the list shows them and names fields in words', () => {
    expect(pathLabel('mission.legs[2].toAltitude')).toBe('leg 3 › target altitude');
    expect(pathLabel('airframe.weights.maxZeroFuel')).toBe('maximum zero-fuel weight');
    expect(pathLabel('inlets[0].name')).toBe('inlet design 1 › name');
    expect(pathLabel('(file)')).toBe('the file');
  });

  it('labels statuses and ratings in words, never as codes', () => {
    for (const r of RATING_NAMES) expect(ratingLabel(r)).toMatch(/^[a-z -]+$/);
    expect(ratingLabel('maxClimb')).toBe('maximum climb');
    expect(statusLabel('climb_not_reached')).toBe('climb not reached');
    expect(statusLabel('some_new_status')).toBe('some new status');
    expect(codeWords('payloadRange')).toBe('payload range');
  });
});
