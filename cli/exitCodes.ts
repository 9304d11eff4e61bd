/**
 * The command line's exit codes (README "Exit codes"): one per kind of
 * ending, so a batch script can tell a bad command line from a bad file, a
 * mission that cannot be flown from one that breaks a hard limit, and a fault
 * of the program itself (70 is EX_SOFTWARE of BSD's sysexits.h, common
 * practice for an internal error).
 */
import { type MissionStatus, missionStatusClass, type MissionStatusClass } from '../engine/mission';

export const EXIT_OK = 0;
/** A file cannot be read or is not valid (project, deck, design file); each problem on stderr. */
export const EXIT_FILE = 1;
/** A bad command line: one line on stderr. */
export const EXIT_USAGE = 2;
/** The mission or analysis ran but found no solution (no convergence, no solution, analysis failed). */
export const EXIT_NOT_SOLVED = 3;
/** The mission cannot reach its destination (fuel exhausted, climb or thrust short, no ground progress, outside the models). */
export const EXIT_CANNOT_REACH = 4;
/** The mission was flown but breaks a hard limit (MTOW, fuel capacity, MLW). */
export const EXIT_HARD_LIMIT = 5;
/** A fault inside Blockwise: one line saying what was being done; please report it. */
export const EXIT_INTERNAL = 70;

const BY_CLASS: Readonly<Record<MissionStatusClass, number>> = {
  solved: EXIT_OK,
  not_solved: EXIT_NOT_SOLVED,
  cannot_reach: EXIT_CANNOT_REACH,
  hard_limit: EXIT_HARD_LIMIT,
  internal_error: EXIT_INTERNAL,
};

/** The exit code of a mission that ended with `status`. */
export function missionExitCode(status: MissionStatus): number {
  return BY_CLASS[missionStatusClass(status)];
}

/** Every exit code the command line uses, for the documentation test. */
export const EXIT_CODES: readonly number[] = [EXIT_OK, EXIT_FILE, EXIT_USAGE, EXIT_NOT_SOLVED, EXIT_CANNOT_REACH, EXIT_HARD_LIMIT, EXIT_INTERNAL];
