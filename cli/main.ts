import { SAFETY_NOTICE } from '../engine/core';
import { escapeControlCharacters } from '../hostio/terminalText';
import { EXIT_INTERNAL, EXIT_OK, EXIT_USAGE } from './exitCodes';
import { parseVerbArgs, UsageError, type CliIo } from './verb';
import { VERB_CATALOGUE } from './verbs/catalogue';
import { isVerbName, VERB_LOADERS } from './verbs/loaders';

function overview(): string {
  const width = Math.max(...VERB_CATALOGUE.map((v) => v.name.length));
  const lines = VERB_CATALOGUE.map((v) => `  ${v.name.padEnd(width)}  ${v.summary}`);
  return [
    'blockwise — mission performance on installed engine thrust',
    '',
    'Usage: blockwise <verb> [options]      blockwise <verb> --help',
    '',
    'Verbs:',
    ...lines,
    '',
    SAFETY_NOTICE,
    '',
  ].join('\n');
}

/** The sub-verbs of a verb group ("deck" -> "deck check", "deck at"), from the verbs and the catalogue. */
function subVerbs(group: string, names: readonly { readonly name: string; readonly summary: string }[]): string[] {
  return names.filter((v) => v.name.startsWith(`${group} `)).map((v) => `${v.name.slice(group.length + 1)} (${v.summary})`);
}

/** What was being done, for the one line of an internal error: the command line (cut to 160 characters). */
function doing(argv: readonly string[]): string {
  const line = ['blockwise', ...argv].join(' ');
  return `running "${line.length > 160 ? `${line.slice(0, 157)}...` : line}"`;
}

/** The one line printed for a fault inside Blockwise (never a stack trace). */
export function internalErrorLine(what: string, e: unknown): string {
  const reason = (e instanceof Error ? e.message : String(e)).split('\n')[0]!.slice(0, 300);
  return `blockwise: internal error while ${what}: ${reason}. This is a fault in Blockwise; please report it with the command line and the files (exit ${EXIT_INTERNAL}).\n`;
}

/** An io whose every text has its control characters escaped (names and values from files reach the terminal). */
function escapedIo(io: CliIo): CliIo {
  return { ...io, out: (t) => io.out(escapeControlCharacters(t)), err: (t) => io.err(escapeControlCharacters(t)) };
}

/**
 * Runs the command line in-process and returns the exit code (cli/exitCodes.ts). Never throws: a bad command
 * line is one line on stderr (exit 2), and a fault inside Blockwise one line saying what was being done (exit 70).
 */
export async function runCli(argv: readonly string[], rawIo: CliIo): Promise<number> {
  const io = escapedIo(rawIo);
  const [name, ...rest] = argv;
  if (name === undefined || name === '--help' || name === '-h' || name === 'help') {
    io.out(overview());
    return name === undefined ? EXIT_USAGE : EXIT_OK;
  }
  try {
    // Only the verb that runs is loaded (and the engine behind it), so the
    // overview above prints at once and a verb starts without the others.
    // Verbs with sub-verbs (e.g. `deck check`) are catalogued as "deck check".
    const sub = rest[0];
    const joined = sub === undefined ? '' : `${name} ${sub}`;
    const known = isVerbName(joined) ? joined : isVerbName(name) ? name : null;
    if (known === null) {
      const subs = subVerbs(name, VERB_CATALOGUE);
      if (subs.length > 0) {
        if (sub === '--help' || sub === '-h') {
          io.out(`blockwise ${name} <sub-verb> ...: ${subs.join('; ')}\n`);
          return EXIT_OK;
        }
        const given = sub === undefined || sub.startsWith('-') ? '' : `${JSON.stringify(sub)} is not one of its sub-verbs; `;
        io.err(`blockwise ${name}: ${given}give a sub-verb: ${subs.join('; ')}\n`);
        return EXIT_USAGE;
      }
      io.err(`blockwise: unknown verb ${JSON.stringify(name)}; run "blockwise --help" for the list\n`);
      return EXIT_USAGE;
    }
    const verb = await VERB_LOADERS[known]();
    const verbArgv = verb.name.includes(' ') ? rest.slice(1) : rest;
    try {
      const parsed = parseVerbArgs(verb, verbArgv);
      if (parsed.values.help === true) {
        io.out(`${verb.help.trimEnd()}\n`);
        return EXIT_OK;
      }
      return await verb.run(parsed.values, parsed.positionals, io);
    } catch (e) {
      if (e instanceof UsageError || (e instanceof TypeError && 'code' in e)) {
        io.err(`blockwise ${verb.name}: ${e.message.split('\n')[0]}\n`);
        return EXIT_USAGE;
      }
      throw e;
    }
  } catch (e) {
    io.err(internalErrorLine(doing(argv), e));
    return EXIT_INTERNAL;
  }
}
