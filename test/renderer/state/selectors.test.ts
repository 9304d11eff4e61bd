import { describe, expect, it } from 'vitest';
import type { MissionResult } from '../../../engine/mission/missionTypes';
import { selectCanRedo, selectCanUndo, selectDirty, selectFieldView, selectHeadline, selectIssuesUnder, selectProject, selectUndoLabel } from '../../../renderer/state/selectors';
import { studyReducer } from '../../../renderer/state/studyReducer';
import { emptyStudy } from '../../../renderer/state/studyState';
import { undoKeyCommand } from '../../../renderer/state/undoKeys';
import { demoState } from '../support/studyHarness';

const OEW = ['airframe', 'weights', 'operatingEmpty'] as const;

describe('selectors', () => {
  it('selectProject, selectCanUndo/Redo, selectUndoLabel and selectDirty follow the history', () => {
    expect(selectProject(emptyStudy())).toBeNull();
    expect(selectDirty(emptyStudy())).toBe(false);
    const s0 = demoState();
    expect(selectCanUndo(s0)).toBe(false);
    expect(selectDirty(s0)).toBe(false);
    const s1 = studyReducer(s0, { type: 'fieldEdited', path: OEW, text: '19100 lb', unit: 'mass', label: 'Set OEW' });
    expect(selectCanUndo(s1)).toBe(true);
    expect(selectUndoLabel(s1)).toBe('Set OEW');
    expect(selectDirty(s1)).toBe(true);
    const s2 = studyReducer(s1, { type: 'undo' });
    expect(selectCanRedo(s2)).toBe(true);
    expect(selectDirty(s2)).toBe(false);
  });

  it('selectFieldView shows the draft with its message, else the value in display units', () => {
    const s0 = demoState();
    expect(selectFieldView(s0, OEW, 'mass')).toEqual({ text: '19,000 lb', error: null });
    const si = studyReducer(s0, { type: 'unitsChosen', units: 'si' });
    // 19,000 lb x 0.45359237 kg/lb = 8,618.25503 kg (NIST SP 811)
    // shown with four significant digits, whole digits kept: 8,618 kg
    expect(selectFieldView(si, OEW, 'mass').text).toBe('8,618 kg');
    const bad = studyReducer(s0, { type: 'fieldEdited', path: OEW, text: 'heavy', unit: 'mass', label: 'x' });
    const view = selectFieldView(bad, OEW, 'mass');
    expect(view.text).toBe('heavy');
    expect(view.error).toMatch(/does not start with a number/);
  });

  it('selectIssuesUnder filters by path prefix', () => {
    const s = studyReducer(demoState(), { type: 'fieldEdited', path: ['airframe', 'weights', 'maxTakeoff'], text: '21000 lb', unit: 'mass', label: 'x' });
    expect(selectIssuesUnder(s, 'airframe').length).toBeGreaterThan(0);
    expect(selectIssuesUnder(s, 'airframe.weights').length).toBeGreaterThan(0);
    expect(selectIssuesUnder(s, 'mission')).toEqual([]);
    expect(selectIssuesUnder(s, 'air')).toEqual([]);
  });

  it('selectHeadline formats the mission figures in the unit system', () => {
    const result = { blockFuel_kg: 453.59237, blockTime_s: 7500, tripFuel_kg: 100, reserveFuel_kg: 50, takeoffMass_kg: 1000, landingMass_kg: 900, zeroFuelMass_kg: 850, airDistance_m: 1852 * 100 } as MissionResult;
    const c = selectHeadline(result, 'customary');
    // 453.59237 kg = 1,000 lb exactly; 7,500 s = 2 h 05 min; 185.2 km = 100 nmi (NIST SP 811)
    expect(c.find((f) => f.id === 'block-fuel')?.text).toBe('1,000 lb');
    expect(c.find((f) => f.id === 'block-time')?.text).toBe('2 h 05 min');
    expect(c.find((f) => f.id === 'distance')?.text).toBe('100 nmi');
    const s = selectHeadline(result, 'si');
    expect(s.find((f) => f.id === 'block-fuel')?.text).toBe('454 kg');
    expect(s.find((f) => f.id === 'block-time')?.text).toBe('125.0 min');
    expect(s.map((f) => f.id)).toEqual(['block-fuel', 'block-time', 'trip-fuel', 'reserve-fuel', 'tow', 'lw', 'zfw', 'distance']);
  });
});

describe('undoKeyCommand', () => {
  const key = (k: string, mods: Partial<{ ctrlKey: boolean; metaKey: boolean; shiftKey: boolean; altKey: boolean }> = {}) =>
    undoKeyCommand({ key: k, ctrlKey: false, metaKey: false, shiftKey: false, altKey: false, ...mods });
  it('maps Ctrl+Z to undo, Ctrl+Shift+Z and Ctrl+Y to redo, Cmd like Ctrl, anything else to nothing', () => {
    expect(key('z', { ctrlKey: true })).toBe('undo');
    expect(key('Z', { ctrlKey: true, shiftKey: true })).toBe('redo');
    expect(key('y', { ctrlKey: true })).toBe('redo');
    expect(key('z', { metaKey: true })).toBe('undo');
    expect(key('z')).toBeNull();
    expect(key('z', { ctrlKey: true, altKey: true })).toBeNull();
    expect(key('x', { ctrlKey: true })).toBeNull();
  });
});
