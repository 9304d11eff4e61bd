import { describe, expect, it } from 'vitest';
import { openProjectAction } from '../../../renderer/state/documentActions';
import { studyReducer } from '../../../renderer/state/studyReducer';
import { emptyStudy, type StudyState } from '../../../renderer/state/studyState';
import type { StudyAction } from '../../../renderer/state/studyActions';
import { expectClose } from '../../support/assertInDelta';
import { demoState } from '../support/studyHarness';
import { fixtureText } from '../support/fakeBridge';

// Unit factors: NIST SP 811 appendix B (1 ft = 0.3048 m, 1 lb = 0.45359237 kg,
// 1 kt = 1852/3600 m/s, 1 nmi = 1852 m), all exact.
const FT = 0.3048;
const LB = 0.45359237;

function run(state: StudyState, ...actions: StudyAction[]): StudyState {
  return actions.reduce(studyReducer, state);
}

const OEW = ['airframe', 'weights', 'operatingEmpty'] as const;
const CD0_0 = ['polar', 'cd0', 0, 'cd0'] as const;

describe('studyReducer', () => {
  it('projectOpened starts an empty history with the parsed project and no issues', () => {
    const s = demoState();
    expect(s.doc?.past).toEqual([]);
    expect(s.doc?.future).toEqual([]);
    expect(s.issues).toEqual([]);
    expect(s.deckFile?.name).toBe('demo-engine.deck.csv');
    // fixtures/demo/demo.blockwise.json writes "operatingEmpty": "19000 lb"
    expectClose(s.doc!.present.airframe.weights.operatingEmpty, 19000 * LB, { rel: 1e-12 }, 'NIST SP 811 lb');
  });

  it('projectOpened with unsaved work starts edited', () => {
    const s = demoState();
    const again = run(s, { type: 'projectOpened', project: s.doc!.present, name: 'x', deckFile: null, unsaved: true });
    expect(again.savedAtStep).toBeNull();
    expect(run(again, { type: 'saved' }).savedAtStep).toBe(0);
  });

  it('projectOpenFailed keeps the open project and lists every issue with its path', () => {
    const s = demoState();
    const bad = run(s, openProjectAction('weights-out-of-order.blockwise.json', fixtureText('fixtures/bad-projects/weights-out-of-order.blockwise.json'), null));
    expect(bad.doc).toBe(s.doc);
    expect(bad.openIssues.length).toBeGreaterThan(0);
    expect(bad.openIssues[0]!.path).toMatch(/^airframe\.weights\./);
  });

  it('fieldEdited with a unit stores SI and records an undo step', () => {
    const s = run(demoState(), { type: 'fieldEdited', path: OEW, text: '20,000 lb', unit: 'mass', label: 'Set OEW' });
    expectClose(s.doc!.present.airframe.weights.operatingEmpty, 20000 * LB, { rel: 1e-12 }, 'NIST SP 811 lb');
    expect(s.doc!.past.map((p) => p.label)).toEqual(['Set OEW']);
    expect(s.drafts).toEqual({});
  });

  it('fieldEdited reads a bare number in the unit the field shows', () => {
    const customary = run(demoState(), { type: 'fieldEdited', path: ['mission', 'solve', 'payload'], text: '2000', unit: 'mass', label: 'payload' });
    expect(customary.units).toBe('customary');
    expectClose(customary.doc!.present.mission.solve.payload, 2000 * LB, { rel: 1e-12 }, 'NIST SP 811 lb');
    const ft = run(demoState(), { type: 'fieldEdited', path: ['mission', 'reserves', 'alternate', 'cruiseAltitude'], text: '21000', unit: 'altitude', label: 'alt' });
    expectClose(ft.doc!.present.mission.reserves.alternate!.cruiseAltitude, 21000 * FT, { rel: 1e-12 }, 'NIST SP 811 ft');
    const si = run(demoState(), { type: 'unitsChosen', units: 'si' }, { type: 'fieldEdited', path: OEW, text: '9000', unit: 'mass', label: 'oew' });
    expect(si.doc!.present.airframe.weights.operatingEmpty).toBe(9000);
  });

  it('fieldEdited with text that does not parse keeps a draft with the message and leaves the project alone', () => {
    const s0 = demoState();
    const s = run(s0, { type: 'fieldEdited', path: CD0_0, text: '0.02x', unit: 'dimensionless', label: 'cd0' });
    expect(s.doc).toBe(s0.doc);
    expect(s.drafts['polar.cd0[0].cd0']?.text).toBe('0.02x');
    expect(s.drafts['polar.cd0[0].cd0']?.message).toMatch(/unknown unit "x"/);
    const wrongDimension = run(s0, { type: 'fieldEdited', path: OEW, text: '3 ft', unit: 'mass', label: 'oew' });
    expect(wrongDimension.drafts['airframe.weights.operatingEmpty']?.message).toMatch(/is a length, expected a mass/);
    expect(wrongDimension.doc).toBe(s0.doc);
  });

  it("fieldEdited that breaks the project's rule at that field is a draft with the project's message", () => {
    const s0 = demoState();
    // MZFW above MTOW (36,500 lb in the demo) breaks the weights order (engine/project/projectChecks.ts)
    const s = run(s0, { type: 'fieldEdited', path: ['airframe', 'weights', 'maxZeroFuel'], text: '40000 lb', unit: 'mass', label: 'mzfw' });
    expect(s.doc).toBe(s0.doc);
    expect(s.drafts['airframe.weights.maxZeroFuel']?.message).toMatch(/above the maximum takeoff weight/);
    // Out of the schema's altitude range (-2,000 ft to 65,000 ft)
    const high = run(s0, { type: 'fieldEdited', path: ['mission', 'legs', 3, 'altitude'], text: '70000 ft', unit: 'altitude', label: 'alt' });
    expect(high.doc).toBe(s0.doc);
    expect(high.drafts['mission.legs[3].altitude']?.message).toMatch(/65,000 ft/);
  });

  it('a valid edit after a draft clears the draft; a rule broken elsewhere is accepted and listed', () => {
    const s = run(
      demoState(),
      { type: 'fieldEdited', path: OEW, text: 'abc', unit: 'mass', label: 'oew' },
      { type: 'fieldEdited', path: OEW, text: '19500 lb', unit: 'mass', label: 'oew' },
    );
    expect(s.drafts).toEqual({});
    // Lowering MTOW below MZFW (21,500 lb) raises the issue at maxZeroFuel, not at the edited field
    const low = run(s, { type: 'fieldEdited', path: ['airframe', 'weights', 'maxTakeoff'], text: '21000 lb', unit: 'mass', label: 'mtow' });
    expectClose(low.doc!.present.airframe.weights.maxTakeoff, 21000 * LB, { rel: 1e-12 }, 'NIST SP 811 lb');
    expect(low.issues.map((i) => i.path)).toContain('airframe.weights.maxZeroFuel');
  });

  it('undo and redo walk the inverse patches back and forth', () => {
    const s0 = demoState();
    const edited = run(
      s0,
      { type: 'fieldEdited', path: CD0_0, text: '0.0200', unit: 'dimensionless', label: 'cd0 a' },
      { type: 'fieldEdited', path: CD0_0, text: '0.0210', unit: 'dimensionless', label: 'cd0 b' },
    );
    expect(edited.doc!.present.polar.cd0[0]!.cd0).toBe(0.021);
    const once = run(edited, { type: 'undo' });
    expect(once.doc!.present.polar.cd0[0]!.cd0).toBe(0.02);
    const twice = run(once, { type: 'undo' });
    expect(twice.doc!.present).toEqual(s0.doc!.present);
    expect(run(twice, { type: 'undo' })).toBe(twice);
    const again = run(twice, { type: 'redo' }, { type: 'redo' });
    expect(again.doc!.present.polar.cd0[0]!.cd0).toBe(0.021);
    expect(run(again, { type: 'redo' })).toBe(again);
    // A new edit after an undo drops the redo stack
    const branched = run(once, { type: 'fieldEdited', path: CD0_0, text: '0.03', unit: 'dimensionless', label: 'cd0 c' });
    expect(branched.doc!.future).toEqual([]);
  });

  it('undo clears field drafts and recomputes the issues', () => {
    const s = run(
      demoState(),
      { type: 'fieldEdited', path: ['airframe', 'weights', 'maxTakeoff'], text: '21000 lb', unit: 'mass', label: 'mtow' },
      { type: 'fieldEdited', path: OEW, text: 'x', unit: 'mass', label: 'oew' },
    );
    expect(s.issues.length).toBeGreaterThan(0);
    const u = run(s, { type: 'undo' });
    expect(u.drafts).toEqual({});
    expect(u.issues).toEqual([]);
  });

  it('valueSet sets and removes values, rowAdded and rowRemoved edit tables', () => {
    const s0 = demoState();
    const rows = s0.doc!.present.polar.cd0.length;
    const added = run(s0, { type: 'rowAdded', path: ['polar', 'cd0'], label: 'add' });
    expect(added.doc!.present.polar.cd0).toHaveLength(rows + 1);
    expect(added.doc!.present.polar.cd0[rows]).toEqual(s0.doc!.present.polar.cd0[rows - 1]);
    const removed = run(s0, { type: 'rowRemoved', path: ['polar', 'cd0'], index: 0, label: 'remove' });
    expect(removed.doc!.present.polar.cd0[0]).toEqual(s0.doc!.present.polar.cd0[1]);
    const limit = run(s0, { type: 'valueSet', path: ['cautions', 'maxThroatMach'], value: 0.75, label: 'throat' });
    expect(limit.doc!.present.cautions.maxThroatMach).toBe(0.75);
    const reset = run(limit, { type: 'valueSet', path: ['cautions', 'maxThroatMach'], value: undefined, label: 'reset' });
    expect('maxThroatMach' in reset.doc!.present.cautions).toBe(false);
    const inlet = run(s0, { type: 'valueSet', path: ['activeInlet'], value: s0.doc!.present.inlets[1]!.name, label: 'inlet' });
    expect(inlet.doc!.present.activeInlet).toBe(s0.doc!.present.inlets[1]!.name);
  });

  it('a one-row table keeps its row', () => {
    let s = demoState();
    const n = s.doc!.present.polar.cd0.length;
    for (let k = 0; k < n + 2; k++) s = run(s, { type: 'rowRemoved', path: ['polar', 'cd0'], index: 0, label: 'remove' });
    expect(s.doc!.present.polar.cd0).toHaveLength(1);
  });

  it('leg actions add, remove, duplicate, move and replace legs', () => {
    const s0 = demoState();
    const legs = s0.doc!.present.mission.legs;
    const kinds = legs.map((l) => l.kind);
    const added = run(s0, { type: 'legAdded', kind: 'hold' });
    expect(added.doc!.present.mission.legs.map((l) => l.kind)).toEqual([...kinds, 'hold']);
    const removed = run(s0, { type: 'legRemoved', index: 0 });
    expect(removed.doc!.present.mission.legs.map((l) => l.kind)).toEqual(kinds.slice(1));
    const dup = run(s0, { type: 'legDuplicated', index: 1 });
    // The copy is the leg under a name of its own.
    expect(dup.doc!.present.mission.legs[2]).toEqual({ ...legs[1], name: `${legs[1]!.name ?? 'Takeoff'} (copy)` });
    expect(dup.doc!.present.mission.legs).toHaveLength(legs.length + 1);
    const moved = run(s0, { type: 'legMoved', index: 1, by: 1 });
    expect(moved.doc!.present.mission.legs[1]).toEqual(legs[2]);
    expect(moved.doc!.present.mission.legs[2]).toEqual(legs[1]);
    expect(run(s0, { type: 'legMoved', index: 0, by: -1 })).toBe(s0);
    expect(run(s0, { type: 'legMoved', index: legs.length - 1, by: 1 })).toBe(s0);
    const replaced = run(s0, { type: 'legReplaced', index: 0, leg: { kind: 'taxiOut', time: 300, fuelFlow: 'idle' } });
    expect(replaced.doc!.present.mission.legs[0]).toEqual({ kind: 'taxiOut', time: 300, fuelFlow: 'idle' });
    // every leg action is one undo step that restores the legs exactly
    for (const s of [added, removed, dup, moved, replaced]) expect(run(s, { type: 'undo' }).doc!.present.mission.legs).toEqual(legs);
  });

  it('deckImported is one undo step of deck file and project reference together; redo re-applies both', () => {
    const s0 = run(demoState(), { type: 'saved' });
    const other = { name: 'other.deck.json', text: '{}' };
    const s = run(s0, { type: 'deckImported', deckFile: other });
    expect(s.deckFile).toEqual(other);
    expect(s.doc!.present.engine.deck).toEqual({ kind: 'file', path: 'other.deck.json' });
    expect(s.doc!.past).toHaveLength(1);
    expect(s.savedAtStep).not.toBe(s.doc!.past.length); // edited
    const undone = run(s, { type: 'undo' });
    expect(undone.deckFile).toBe(s0.deckFile);
    expect(undone.doc!.present).toEqual(s0.doc!.present);
    expect(undone.savedAtStep).toBe(undone.doc!.past.length); // back to the saved state: unedited
    const redone = run(undone, { type: 'redo' });
    expect(redone.deckFile).toEqual(other);
    expect(redone.doc!.present.engine.deck).toEqual({ kind: 'file', path: 'other.deck.json' });
    // An edit after the import and its undo leave the imported deck in place.
    const edited = run(s, { type: 'valueSet', path: ['name'], value: 'renamed', label: 'Rename' }, { type: 'undo' });
    expect(edited.deckFile).toEqual(other);
  });

  it('a new deck text under the same file name is still its own undo step', () => {
    const s0 = demoState();
    const same = { name: s0.deckFile!.name, text: `${s0.deckFile!.text}\n` };
    const s = run(s0, { type: 'deckImported', deckFile: same });
    expect(s.doc!.past).toHaveLength(1);
    expect(s.doc!.present).toEqual(s0.doc!.present);
    expect(run(s, { type: 'undo' }).deckFile).toBe(s0.deckFile);
  });

  it('unitsChosen changes display only: the project is the same object', () => {
    const s0 = demoState();
    const s = run(s0, { type: 'unitsChosen', units: 'si' });
    expect(s.units).toBe('si');
    expect(s.doc).toBe(s0.doc);
  });

  it('highlighted, draftDiscarded and saved touch only their part', () => {
    const s0 = run(demoState(), { type: 'fieldEdited', path: OEW, text: 'x', unit: 'mass', label: 'oew' });
    const h = run(s0, { type: 'highlighted', highlight: { legIndex: 2, time_s: 600 } });
    expect(h.highlight).toEqual({ legIndex: 2, time_s: 600 });
    expect(h.doc).toBe(s0.doc);
    expect(run(s0, { type: 'draftDiscarded', path: OEW }).drafts).toEqual({});
    const edited = run(s0, { type: 'fieldEdited', path: OEW, text: '19100 lb', unit: 'mass', label: 'oew' });
    expect(edited.savedAtStep).toBe(0);
    expect(run(edited, { type: 'saved' }).savedAtStep).toBe(1);
  });

  it('edits before any project is open change nothing', () => {
    const empty = emptyStudy();
    expect(run(empty, { type: 'fieldEdited', path: OEW, text: '1 kg', unit: 'mass', label: 'x' })).toBe(empty);
    expect(run(empty, { type: 'undo' })).toBe(empty);
    expect(run(empty, { type: 'legAdded', kind: 'cruise' })).toBe(empty);
  });
});
