/**
 * The `cycle` sub-verbs' shared step: read a cycle file named on the
 * command line, parse it and design the engine; on failure print the
 * located issues (or the design error) on stderr and return null.
 */
import { parseCycleFile } from '../../../engine/cycle';
import { designEngine, type CycleEngine } from '../../../engine/cycle/index';
import { readTextFile } from '../../common/textFile';
import { UsageError, type CliIo } from '../../verb';

/** The one positional argument: the cycle file. */
export function cycleFileArgument(positionals: readonly string[]): string {
  if (positionals.length !== 1) throw new UsageError(`give exactly one cycle file (got ${positionals.length})`);
  return positionals[0]!;
}

/** The designed engine of a cycle file, or null after printing why not (exit code 1 for the caller). */
export function readDesignedCycle(file: string, verb: string, io: CliIo): CycleEngine | null {
  const text = readTextFile(file, verb, io);
  if (text === null) return null;
  const spec = parseCycleFile(text, file);
  if (!spec.ok) {
    io.err(`${spec.error.map((i) => i.message).join('\n')}\n${file}: cycle not loaded (${spec.error.length} error${spec.error.length === 1 ? '' : 's'})\n`);
    return null;
  }
  const engine = designEngine(spec.value);
  if (!engine.ok) {
    io.err(`blockwise ${verb}: ${file}: ${engine.error.message}\n`);
    return null;
  }
  return engine.value;
}
