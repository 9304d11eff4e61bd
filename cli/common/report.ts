/**
 * How every verb ends its output: text reports close with the safety notice
 * (DESIGN.md §7), JSON documents carry it under `notice`, and an analysis
 * that ran but failed says so on stderr with its own exit code.
 */
import type { Caution } from '../../engine/cautions';
import { SAFETY_NOTICE, SAFETY_NOTICE_LINES } from '../../engine/core';
import { EXIT_NOT_SOLVED } from '../exitCodes';
import { printJson, type CliIo } from '../verb';

/** Exit code when the analysis ran but could not produce its result (message on stderr). */
export const EXIT_ANALYSIS_FAILED = EXIT_NOT_SOLVED;

/** The report's lines, a blank line, the safety notice and a final newline, as one text. */
export function reportText(lines: readonly string[]): string {
  return [...lines, '', ...SAFETY_NOTICE_LINES, ''].join('\n');
}

/** Prints a text report ending with the safety notice. */
export function printReport(io: CliIo, lines: readonly string[]): void {
  io.out(reportText(lines));
}

/** Prints a JSON document with the safety notice as its last key, `notice`. */
export function printJsonReport(io: CliIo, value: Readonly<Record<string, unknown>>): void {
  printJson(io, { ...value, notice: SAFETY_NOTICE });
}

/** A blank line, "Cautions:" and one line per caution; nothing when there are none. */
export function cautionBlock(cautions: readonly Caution[]): string[] {
  if (cautions.length === 0) return [];
  return ['', 'Cautions:', ...cautions.map((c) => `  [${c.severity}] ${c.id}: ${c.message}`)];
}

/** Prints "blockwise <verb>: <message>" on stderr and returns EXIT_ANALYSIS_FAILED. */
export function analysisFailed(io: CliIo, verb: string, message: string): number {
  io.err(`blockwise ${verb}: ${message}\n`);
  return EXIT_ANALYSIS_FAILED;
}

/** "ISA+10.0 K", "ISA-5.0 K". */
export function isaText(isaDev_K: number): string {
  return `ISA${isaDev_K >= 0 ? '+' : ''}${isaDev_K.toFixed(1)} K`;
}
