/**
 * The process around runCli: exit code, and a last guard so that nothing a
 * user sees is a stack trace (a fault outside runCli, or a closed pipe).
 */
import { EXIT_INTERNAL } from './exitCodes';
import { internalErrorLine, runCli } from './main';

function lastResort(e: unknown): void {
  // A reader that closed the pipe (`blockwise ... | head`) is not an error of ours: stop quietly.
  if ((e as NodeJS.ErrnoException | null)?.code === 'EPIPE') process.exit(0);
  process.stderr.write(internalErrorLine('running the command line', e));
  process.exit(EXIT_INTERNAL);
}
process.on('uncaughtException', lastResort);
process.on('unhandledRejection', lastResort);
process.stdout.on('error', lastResort);

// No top-level await: the bundle of this entry is a classic script (scripts/buildCli.mjs), so that
// bin/cliCodeCache.mjs can start it from V8's code cache.
void runCli(process.argv.slice(2), {
  out: (t) => process.stdout.write(t),
  err: (t) => process.stderr.write(t),
  cwd: process.cwd(),
}).then((code) => {
  process.exitCode = code;
  // Done: leave now rather than when the event loop runs dry, which first waits for handles
  // closing and runs V8's idle-time garbage collection (its incremental marking finished, a full
  // mark-compact of about 10 ms that a process about to exit never needs). Only with nothing
  // left to write: on Linux writes to files, pipes and terminals are synchronous, so always;
  // where a pipe is asynchronous (macOS) the loop drains it first, as before.
  if (process.stdout.writableLength === 0 && process.stderr.writableLength === 0) process.exit(code);
}, lastResort);
