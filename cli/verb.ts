import { parseArgs, type ParseArgsConfig } from 'node:util';

/** Where a verb writes and reads; in-process tests pass their own. */
export interface CliIo {
  readonly out: (text: string) => void;
  readonly err: (text: string) => void;
  readonly cwd: string;
}

/** One command-line verb: `blockwise <name> ...`. */
export interface Verb {
  readonly name: string;
  /** One line for the verb list. */
  readonly summary: string;
  /** Full help text printed by `blockwise <name> --help`. */
  readonly help: string;
  readonly options: NonNullable<ParseArgsConfig['options']>;
  readonly allowPositionals?: boolean;
  /** Returns the process exit code. */
  run(
    values: Readonly<Record<string, string | boolean | (string | boolean)[] | undefined>>,
    positionals: readonly string[],
    io: CliIo,
  ): Promise<number> | number;
}

/** Options that each take a value (`--name <text>`), read and checked by the verb. */
export function stringOptions(...names: readonly string[]): Record<string, { readonly type: 'string' }> {
  return Object.fromEntries(names.map((name) => [name, { type: 'string' } as const]));
}

/** A bad command line: printed as one line on stderr, exit code 2. */
export class UsageError extends Error {}

export function parseVerbArgs(verb: Verb, argv: readonly string[]) {
  return parseArgs({
    args: [...argv],
    options: { ...verb.options, help: { type: 'boolean', short: 'h' } },
    allowPositionals: verb.allowPositionals ?? false,
    strict: true,
  });
}

/** Reads a string option that must be present. */
export function requireString(
  values: Readonly<Record<string, unknown>>,
  name: string,
): string {
  const v = values[name];
  if (typeof v !== 'string' || v.trim() === '') {
    throw new UsageError(`missing --${name}`);
  }
  return v;
}

export function optionalString(
  values: Readonly<Record<string, unknown>>,
  name: string,
): string | undefined {
  const v = values[name];
  return typeof v === 'string' ? v : undefined;
}

/** Prints a value as stable, pretty JSON with a trailing newline. */
export function printJson(io: CliIo, value: unknown): void {
  io.out(`${JSON.stringify(value, null, 2)}\n`);
}
