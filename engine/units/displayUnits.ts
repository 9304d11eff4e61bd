/**
 * Display units per kind of quantity and unit system, and formatting of SI
 * values for tables, charts and reports. Formatting is locale-independent
 * (comma thousands separator, point decimal) so output is reproducible.
 */
import type { UnitSystem } from './dimension';
import { lookupUnit } from './unitTable';

export type DisplayKind =
  | 'altitude'
  | 'distance'
  | 'speed'
  | 'climbRate'
  | 'mass'
  | 'force'
  | 'fuelFlow'
  | 'temperature'
  | 'temperatureDelta'
  | 'pressure'
  | 'time'
  | 'area'
  | 'power'
  | 'tsfc'
  | 'specificRange';

interface DisplaySpec {
  readonly unit: string;
  /** Default decimals shown. */
  readonly digits: number;
}

const DISPLAY: Readonly<Record<DisplayKind, Readonly<Record<UnitSystem, DisplaySpec>>>> = {
  altitude: { si: { unit: 'm', digits: 0 }, customary: { unit: 'ft', digits: 0 } },
  distance: { si: { unit: 'km', digits: 0 }, customary: { unit: 'nmi', digits: 0 } },
  speed: { si: { unit: 'm/s', digits: 1 }, customary: { unit: 'kt', digits: 0 } },
  climbRate: { si: { unit: 'm/s', digits: 2 }, customary: { unit: 'ft/min', digits: 0 } },
  mass: { si: { unit: 'kg', digits: 0 }, customary: { unit: 'lb', digits: 0 } },
  force: { si: { unit: 'kN', digits: 2 }, customary: { unit: 'lbf', digits: 0 } },
  fuelFlow: { si: { unit: 'kg/h', digits: 0 }, customary: { unit: 'lb/h', digits: 0 } },
  temperature: { si: { unit: 'K', digits: 2 }, customary: { unit: 'degC', digits: 1 } },
  temperatureDelta: { si: { unit: 'K', digits: 1 }, customary: { unit: 'K', digits: 1 } },
  pressure: { si: { unit: 'hPa', digits: 1 }, customary: { unit: 'inHg', digits: 2 } },
  time: { si: { unit: 'min', digits: 1 }, customary: { unit: 'h', digits: 2 } },
  area: { si: { unit: 'm2', digits: 2 }, customary: { unit: 'ft2', digits: 1 } },
  power: { si: { unit: 'kW', digits: 1 }, customary: { unit: 'hp', digits: 0 } },
  tsfc: { si: { unit: 'mg/(N s)', digits: 2 }, customary: { unit: 'lb/(lbf h)', digits: 4 } },
  specificRange: { si: { unit: 'km/kg', digits: 4 }, customary: { unit: 'nmi/(1000 lb)', digits: 2 } },
};

/** The unit a kind of quantity is shown in, e.g. ('altitude', 'customary') -> "ft". */
export function displayUnit(kind: DisplayKind, system: UnitSystem): string {
  return DISPLAY[kind][system].unit;
}

/**
 * The display units' definitions, each looked up once (a lookup normalizes the spelling with four regular
 * expressions: about 1 us, a quarter of a quantity's formatting, paid by every caution and status message). Keyed by the
 * display table's own unit strings, so it holds at most one entry per display unit.
 */
const DISPLAY_UNIT_DEFS = new Map<string, ReturnType<typeof lookupUnit>>();

function displayUnitDef(unit: string): ReturnType<typeof lookupUnit> {
  if (!DISPLAY_UNIT_DEFS.has(unit)) DISPLAY_UNIT_DEFS.set(unit, lookupUnit(unit));
  return DISPLAY_UNIT_DEFS.get(unit);
}

/** An SI value converted to the display unit of its kind (for tables and charts). */
export function toDisplay(value_si: number, kind: DisplayKind, system: UnitSystem): number {
  const def = displayUnitDef(DISPLAY[kind][system].unit);
  if (def === undefined) throw new Error(`display unit of ${kind} is not in the unit table`);
  const offset = kind === 'temperatureDelta' ? 0 : def.offset;
  return (value_si - offset) / def.scale;
}

/** A run of decimal digits with a comma before each group of three from the right ("1234567" -> "1,234,567"). */
function groupThousands(whole: string): string {
  const n = whole.length;
  if (n <= 3) return whole;
  const head = n % 3 || 3;
  let out = whole.slice(0, head);
  for (let i = head; i < n; i += 3) out += `,${whole.slice(i, i + 3)}`;
  return out;
}

/**
 * Fixed-point text with comma thousands separators, independent of locale.
 * The grouping is a loop over the whole part (a lookahead regular expression
 * cost a few microseconds a call, and every pass of a mission writes the
 * messages of its cautions); toFixed's exponent form above 1e21 keeps the
 * expression's reading (no separators inside an exponent).
 */
export function groupDigits(value: number, digits: number): string {
  if (!Number.isFinite(value)) return String(value);
  const fixed = Math.abs(value).toFixed(digits);
  const dot = fixed.indexOf('.');
  const whole = dot < 0 ? fixed : fixed.slice(0, dot);
  const grouped = fixed.includes('e') ? whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',') : groupThousands(whole);
  const negative = value < 0 && Number(fixed) !== 0;
  return `${negative ? '-' : ''}${grouped}${dot < 0 ? '' : fixed.slice(dot)}`;
}

/**
 * An SI value as display text with its unit, e.g. (10668, 'altitude',
 * 'customary') -> "35,000 ft". Customary times read "2 h 05 min" (digits
 * ignored); non-finite values print as "—".
 */
export function formatQuantity(value_si: number, kind: DisplayKind, system: UnitSystem, digits?: number): string {
  if (!Number.isFinite(value_si)) return '—';
  const spec = DISPLAY[kind][system];
  if (kind === 'time' && system === 'customary') {
    const totalMinutes = Math.round(Math.abs(value_si) / 60);
    const hours = Math.floor(totalMinutes / 60);
    const minutes = totalMinutes - 60 * hours;
    return `${value_si < 0 && totalMinutes > 0 ? '-' : ''}${hours} h ${String(minutes).padStart(2, '0')} min`;
  }
  return `${groupDigits(toDisplay(value_si, kind, system), digits ?? spec.digits)} ${spec.unit}`;
}
