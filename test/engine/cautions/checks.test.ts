import { describe, expect, it } from 'vitest';
import {
  checkBuffetMargin,
  checkClMax,
  checkFuelCapacity,
  checkMlw,
  checkMmo,
  checkMtow,
  checkMzfw,
  checkPolarClamped,
  checkReserve,
  checkResidualClimb,
  checkThroatMach,
  checkThrustBelowDrag,
  checkVmo,
} from '../../../engine/cautions/checks';
import { CAUTION_CATALOGUE } from '../../../engine/cautions/cautionCatalogue';
import { DEFAULT_CAUTION_SETTINGS } from '../../../engine/cautions/cautionSettings';
import { messageText } from '../../../engine/units/messageParts';

// Each limit fires strictly beyond its threshold: a hair over fires, exactly at and a hair under do not.
const EPS = 1e-9;

describe('checks', () => {
  const upper: [string, (v: number, limit: number) => unknown, number][] = [
    ['checkVmo', (v, l) => checkVmo(v, l + 5, 5), 175],
    ['checkMmo', (v, l) => checkMmo(v, l + 0.02, 0.02), 0.86],
    ['checkClMax', (v, l) => checkClMax(v, l), 1.4],
    ['checkMtow', (v, l) => checkMtow(v, l), 80000],
    ['checkMlw', (v, l) => checkMlw(v, l), 66000],
    ['checkMzfw', (v, l) => checkMzfw(v, l), 60000],
    ['checkFuelCapacity', (v, l) => checkFuelCapacity(v, l), 25000],
    ['checkThroatMach', (v, l) => checkThroatMach(v, l), 0.8],
  ];
  for (const [name, check, limit] of upper) {
    it(`${name} fires just above its limit and not at or below it`, () => {
      expect(check(limit * (1 + EPS), limit)).not.toBeNull();
      expect(check(limit, limit)).toBeNull();
      expect(check(limit * (1 - EPS), limit)).toBeNull();
    });
  }

  const lower: [string, (v: number, limit: number) => unknown, number][] = [
    ['checkBuffetMargin', (v, l) => checkBuffetMargin(v, l), 1.3],
    ['checkResidualClimb', (v, l) => checkResidualClimb(v, l), DEFAULT_CAUTION_SETTINGS.minResidualClimbRate_m_s],
    ['checkReserve', (v, l) => checkReserve(v, l, 1), 2500],
    ['checkThrustBelowDrag', (v, l) => checkThrustBelowDrag(v, l), 40000],
  ];
  for (const [name, check, limit] of lower) {
    it(`${name} fires just below its limit and not at or above it`, () => {
      expect(check(limit * (1 - EPS), limit)).not.toBeNull();
      expect(check(limit, limit)).toBeNull();
      expect(check(limit * (1 + EPS), limit)).toBeNull();
    });
  }

  it('checkVmo reports the value, the threshold (VMO less margin) and the catalogue severity', () => {
    const c = checkVmo(180, 180, 2);
    expect(c).toMatchObject({ id: 'vmo_exceeded', value: 180, threshold: 178, severity: CAUTION_CATALOGUE.vmo_exceeded.severity });
    expect(c?.message).toMatch(/kt/);
  });

  it('a draft\'s message is its parts in both unit systems, the same text however it is read or copied', () => {
    // The text is worked out at the first read (checks.ts draft); a spread, JSON and a structured clone read it too.
    const c = checkVmo(180, 180, 2)!;
    const text = messageText(c.parts!, 'both');
    expect(Object.keys(c)).toEqual(['id', 'severity', 'message', 'parts', 'value', 'threshold']);
    expect(c.message).toBe(text);
    expect(c.message).toBe(text);
    expect({ ...c }.message).toBe(text);
    expect(JSON.parse(JSON.stringify(c)).message).toBe(text);
    expect(structuredClone(c).message).toBe(text);
  });

  it('checkReserve scales the required reserve by the fraction', () => {
    expect(checkReserve(1999, 2500, 0.8)).not.toBeNull();
    expect(checkReserve(2000, 2500, 0.8)).toBeNull();
  });

  it('checkPolarClamped fires when any polar table was left and passes when none was', () => {
    expect(checkPolarClamped([])).toBeNull();
    expect(checkPolarClamped(['cd0', 'clMax'])?.message).toMatch(/cd0, clMax tables/);
  });

  it('checkThroatMach passes when the installation does not compute a throat Mach', () => {
    expect(checkThroatMach(null, 0.8)).toBeNull();
  });
});
