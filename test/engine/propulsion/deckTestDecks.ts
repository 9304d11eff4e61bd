/**
 * Small decks for the deck tests, written as CSV text and parsed through
 * parseDeckCsv so every test also exercises the parser.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { expectOk } from '../../../engine/core/result';
import { parseDeckCsv } from '../../../engine/propulsion/deckCsv';
import type { EngineDeck } from '../../../engine/propulsion/engineDeck';

export interface ReferenceQuery {
  readonly isaDev_K: number;
  readonly altitude_m: number;
  readonly mach: number;
  readonly power: number;
  readonly thrust_N: number;
  readonly fuelFlow_kg_s: number;
  readonly airflow_kg_s: number;
}

export interface ReferenceCase {
  readonly columns: readonly string[];
  readonly rows: readonly (readonly number[])[];
  readonly queries: readonly ReferenceQuery[];
}

export interface ReferenceFile {
  readonly source: string;
  readonly regular: ReferenceCase;
  readonly regular4: ReferenceCase;
  readonly ragged: ReferenceCase;
}

/** Values from test/reference/deckInterpReference.py (scipy / numpy). */
export function loadInterpReference(): ReferenceFile {
  const path = fileURLToPath(new URL('../../reference/deckInterpReference.json', import.meta.url));
  return JSON.parse(readFileSync(path, 'utf8')) as ReferenceFile;
}

/** A reference case as an SI deck CSV (exact round trip of every double). */
export function referenceDeck(c: ReferenceCase, withIsaDev: boolean, extraMetadata = ''): EngineDeck {
  const header = 'altitude[m],mach[-],power[-],thrust[N],fuel_flow[kg/s],airflow[kg/s]' + (withIsaDev ? ',isa_dev[K]' : '');
  const lines = c.rows.map((r) => {
    const [isa, alt, mach, power, thrust, fuel, air] = r;
    return [alt, mach, power, thrust, fuel, air, ...(withIsaDev ? [isa] : [])].map((v) => String(v)).join(',');
  });
  const text = `# title: reference deck\n${extraMetadata}${header}\n${lines.join('\n')}\n`;
  return expectOk(parseDeckCsv(text, 'reference.csv'), 'reference deck');
}

/**
 * A hand-made ragged deck (SI): two altitudes with different Mach ranges and
 * nodes with different power points; thrust piecewise linear and rising.
 */
export const RAGGED_CSV = `# title: hand ragged
# rating flightIdle: 0.2
# rating maxCruise: 0.9
# rating takeoff: 1
altitude[m],mach[-],power[-],thrust[N],fuel_flow[kg/s],airflow[kg/s]
0,0,0.2,4000,0.1,40
0,0,0.5,12000,0.2,60
0,0,1,24000,0.4,80
0,0.5,0.2,3000,0.09,45
0,0.5,0.7,12000,0.25,70
0,0.5,1,19000,0.38,85
3000,0.2,0.2,3000,0.08,35
3000,0.2,0.6,10000,0.2,55
3000,0.2,1,17000,0.33,70
3000,0.6,0.2,2000,0.07,38
3000,0.6,0.4,5000,0.12,50
3000,0.6,0.8,12000,0.24,62
3000,0.6,1,15000,0.3,72
3000,0.8,0.2,1800,0.07,40
3000,0.8,1,14500,0.31,75
`;

export function raggedDeck(extraMetadata = ''): EngineDeck {
  return expectOk(parseDeckCsv(extraMetadata + RAGGED_CSV, 'ragged.csv'), 'ragged deck');
}
