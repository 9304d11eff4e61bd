/**
 * The project a verb works on: the one positional file, an optional inlet
 * design by name, and the project with its deck read from disk and turned
 * into a mission input. Problems with the file are printed (exit 1); a bad
 * command line is a UsageError (exit 2).
 */
import { resolve } from 'node:path';
import type { Project } from '../../engine/project';
import { buildFromProject, formatLoadFailure, readProjectFile, type LoadedProject } from '../projectFiles';
import { UsageError, type CliIo } from '../verb';

/** The one project positional, checked. */
export function projectArgument(positionals: readonly string[], verb: string): string {
  if (positionals.length === 0) throw new UsageError(`missing the project file: blockwise ${verb} <project.blockwise.json>`);
  if (positionals.length > 1) throw new UsageError(`one project file at a time (got ${positionals.length}: ${positionals.join(', ')})`);
  return positionals[0]!;
}

/** Checks that `name` is an inlet design of the project; a UsageError lists the designs. */
export function checkInletName(project: Project, name: string, option: string, file: string): void {
  if (name.trim() === '') throw new UsageError(`${option}: give the name of an inlet design`);
  if (!project.inlets.some((i) => i.name === name)) {
    const names = project.inlets.map((i) => JSON.stringify(i.name)).join(', ');
    throw new UsageError(`${option}: ${JSON.stringify(name)} is not an inlet design of ${file}; it has ${names}`);
  }
}

/**
 * Reads the project `file` (relative to the working folder) and its deck and
 * builds the mission input for `inletName` (default the active inlet).
 * Returns the exit code 1 after printing the problems when the project
 * cannot be used; an unknown inlet name is a UsageError naming `option`,
 * the command-line option it came from.
 */
export async function loadVerbProject(file: string, inletName: string | undefined, io: CliIo, option = '--inlet'): Promise<LoadedProject | number> {
  if (inletName !== undefined && inletName.trim() === '') throw new UsageError(`${option}: give the name of an inlet design`);
  const read = await readProjectFile(resolve(io.cwd, file));
  if (!read.ok) {
    io.err(formatLoadFailure(read.error));
    return 1;
  }
  const { project, projectPath } = read.value;
  if (inletName !== undefined) checkInletName(project, inletName, option, file);
  const loaded = await buildFromProject(projectPath, project, inletName === undefined ? {} : { inletName });
  if (!loaded.ok) {
    io.err(formatLoadFailure(loaded.error));
    return 1;
  }
  return loaded.value;
}
