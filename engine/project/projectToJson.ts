/**
 * Writing a Project back to `*.blockwise.json` text in the current layout.
 * Quantity fields are written as strings with their SI unit ("12496.8 m",
 * "128.6 m/s"), exact to the last digit (JavaScript's shortest round-trip
 * number text), so parse(projectToJson(p)) equals p. The writer walks the
 * schema next to the value to know which fields are quantities.
 */
import type { z } from 'zod';
import { SI_UNIT } from '../units/dimension';
import { quantityDimensionOf } from './quantityField';
import { CURRENT_VERSION, PROJECT_FORMAT, projectSchema, type Project } from './projectSchema';

interface SchemaDef {
  readonly type: string;
  readonly shape?: Readonly<Record<string, z.ZodType>>;
  readonly element?: z.ZodType;
  readonly options?: readonly z.ZodType[];
  readonly innerType?: z.ZodType;
  readonly in?: z.ZodType;
  readonly values?: readonly unknown[];
}

function defOf(schema: z.ZodType): SchemaDef {
  return (schema as unknown as { _zod: { def: SchemaDef } })._zod.def;
}

function isPlainObject(value: unknown): value is Record<string, unknown> {
  return value !== null && typeof value === 'object' && !Array.isArray(value);
}

/** True when `value` (output form) could have come from `schema`; used to pick union options. */
function fits(schema: z.ZodType, value: unknown): boolean {
  if (quantityDimensionOf(schema) !== undefined) return typeof value === 'number';
  const def = defOf(schema);
  switch (def.type) {
    case 'literal':
      return (def.values ?? []).includes(value);
    case 'object':
      if (!isPlainObject(value)) return false;
      return Object.entries(def.shape ?? {}).every(([key, field]) => defOf(field).type !== 'literal' || fits(field, value[key]));
    case 'optional':
    case 'default':
      return value === undefined || fits(def.innerType as z.ZodType, value);
    case 'nullable':
      return value === null || fits(def.innerType as z.ZodType, value);
    default:
      return true;
  }
}

function formatNumber(value: number): string {
  return String(value);
}

function write(schema: z.ZodType, value: unknown): unknown {
  const dimension = quantityDimensionOf(schema);
  if (dimension !== undefined) {
    if (typeof value !== 'number') return value;
    return dimension === 'dimensionless' ? value : `${formatNumber(value)} ${SI_UNIT[dimension]}`;
  }
  const def = defOf(schema);
  switch (def.type) {
    case 'object': {
      if (!isPlainObject(value)) return value;
      const shape = def.shape ?? {};
      const out: Record<string, unknown> = {};
      for (const [key, field] of Object.entries(value)) {
        if (field === undefined) continue;
        const fieldSchema = shape[key];
        out[key] = fieldSchema ? write(fieldSchema, field) : field;
      }
      return out;
    }
    case 'array':
      return Array.isArray(value) ? value.map((v) => write(def.element as z.ZodType, v)) : value;
    case 'union': {
      const option = (def.options ?? []).find((o) => fits(o, value));
      return option ? write(option, value) : value;
    }
    case 'optional':
    case 'default':
    case 'nullable':
      return value === undefined || value === null ? value : write(def.innerType as z.ZodType, value);
    case 'pipe':
      return write(def.in as z.ZodType, value);
    default:
      return value;
  }
}

/**
 * The project as pretty JSON text (2-space indent, trailing newline), current
 * format and version, quantities with SI units. Round trip:
 * parseProject(projectToJson(p)) deep-equals p.
 */
export function projectToJson(project: Project): string {
  const body = write(projectSchema, { ...project, format: PROJECT_FORMAT, version: CURRENT_VERSION });
  return `${JSON.stringify(body, null, 2)}\n`;
}
