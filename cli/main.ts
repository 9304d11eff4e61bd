import { SAFETY_NOTICE } from '../engine/core/notice';
import { parseVerbArgs, UsageError, type CliIo, type Verb } from './verb';
import { VERB_CATALOGUE } from './verbs/catalogue';

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

/** Runs the command line in-process and returns the exit code. */
export async function runCli(argv: readonly string[], io: CliIo): Promise<number> {
  const [name, ...rest] = argv;
  if (name === undefined || name === '--help' || name === '-h' || name === 'help') {
    io.out(overview());
    return name === undefined ? 2 : 0;
  }
  // The verbs (and the engine behind them) load only when one runs, so the
  // overview above prints at once.
  const { verbs } = await import('./verbs/index');
  // Verbs with sub-verbs (e.g. `deck check`) are registered as "deck check".
  const sub = rest[0];
  const verb: Verb | undefined =
    (sub !== undefined && verbs.find((v) => v.name === `${name} ${sub}`)) ||
    verbs.find((v) => v.name === name);
  if (!verb) {
    io.err(`blockwise: unknown verb "${name}"; run "blockwise --help" for the list\n`);
    return 2;
  }
  const verbArgv = verb.name.includes(' ') ? rest.slice(1) : rest;
  try {
    const parsed = parseVerbArgs(verb, verbArgv);
    if (parsed.values.help === true) {
      io.out(`${verb.help.trimEnd()}\n`);
      return 0;
    }
    return await verb.run(parsed.values, parsed.positionals, io);
  } catch (e) {
    if (e instanceof UsageError || (e instanceof TypeError && 'code' in e)) {
      io.err(`blockwise ${verb.name}: ${e.message.split('\n')[0]}\n`);
      return 2;
    }
    throw e;
  }
}
