import { describe, expect, it } from 'vitest';
import { LEG_KIND_ORDER, LEG_KINDS, legKindLabel } from '../../../engine/project/legKinds';
import { legSchema } from '../../../engine/project/projectSchema';

// Self-consistency: the leg-kind table and the project schema's leg union name the same kinds.
function schemaLegKinds(): string[] {
  return legSchema.options.map((option) => {
    const kind = option.shape.kind as unknown as { readonly value?: unknown; readonly def?: { readonly values?: readonly unknown[] } };
    return String(kind.value ?? kind.def?.values?.[0]);
  });
}

describe('LEG_KINDS', () => {
  it('covers every leg kind of the project schema and no other', () => {
    const fromSchema = schemaLegKinds();
    expect(fromSchema.length).toBeGreaterThan(0);
    expect([...LEG_KIND_ORDER].sort()).toEqual([...fromSchema].sort());
  });

  it('gives each kind a distinct, non-empty label', () => {
    const labels = LEG_KIND_ORDER.map(legKindLabel);
    expect(labels.every((l) => l.trim().length > 0)).toBe(true);
    expect(new Set(labels).size).toBe(labels.length);
    expect(legKindLabel('taxiOut')).toBe(LEG_KINDS.taxiOut.label);
  });
});
