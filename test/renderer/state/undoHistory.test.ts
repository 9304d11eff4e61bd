import { describe, expect, it } from 'vitest';
import { applyEdit, redo, startHistory, undo, HISTORY_LIMIT } from '../../../renderer/state/undoHistory';

interface Doc {
  readonly cd0: number[];
  readonly name: string;
}

describe('undoHistory', () => {
  const start = startHistory<Doc>({ cd0: [0.018, 0.019], name: 'demo' });

  it('applyEdit records a step and undo restores the previous document', () => {
    const edited = applyEdit(start, 'raise CD0', (d) => {
      d.cd0[0] = 0.02;
    });
    expect(edited.present.cd0[0]).toBe(0.02);
    expect(edited.past).toHaveLength(1);
    const back = undo(edited);
    expect(back.present).toEqual(start.present);
    expect(back.future).toHaveLength(1);
    expect(redo(back).present.cd0[0]).toBe(0.02);
  });

  it('applyEdit that changes nothing keeps the history', () => {
    const same = applyEdit(start, 'no-op', (d) => {
      d.name = 'demo';
    });
    expect(same).toBe(start);
  });

  it('a new edit after undo clears the redo stack', () => {
    const a = applyEdit(start, 'a', (d) => {
      d.name = 'a';
    });
    const b = applyEdit(undo(a), 'b', (d) => {
      d.name = 'b';
    });
    expect(b.future).toHaveLength(0);
    expect(redo(b)).toBe(b);
  });

  it('undo and redo on empty stacks return the same state', () => {
    expect(undo(start)).toBe(start);
    expect(redo(start)).toBe(start);
  });

  it('keeps at most HISTORY_LIMIT steps', () => {
    let s = start;
    for (let i = 0; i < HISTORY_LIMIT + 5; i++) {
      s = applyEdit(s, `edit ${i}`, (d) => {
        d.name = `n${i}`;
      });
    }
    expect(s.past).toHaveLength(HISTORY_LIMIT);
    expect(s.past[0]?.label).toBe('edit 5');
  });
});
