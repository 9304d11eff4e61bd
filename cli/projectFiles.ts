/**
 * Reading a project file and the deck it names from disk (the engine reads
 * no files). Shared by every verb that takes a project. Relative deck paths
 * resolve from the project file's folder.
 */
import { readFile } from 'node:fs/promises';
import { dirname, extname, resolve } from 'node:path';
import { err, ok, type Result } from '../engine/core/result';
import type { MissionInput } from '../engine/mission/missionTypes';
import { buildMissionInput, type BuildOptions } from '../engine/project/buildMissionInput';
import { deckReference } from '../engine/project/projectDeck';
import { makeIssue, type ProjectIssue } from '../engine/project/projectIssue';
import type { Project } from '../engine/project/projectSchema';
import { parseProject } from '../engine/project/parseProject';
import { parseDeckCsv } from '../engine/propulsion/deckCsv';
import { parseDeckJson } from '../engine/propulsion/deckJson';
import type { EngineDeck } from '../engine/propulsion/engineDeck';

export interface LoadedProject {
  /** Absolute path of the project file. */
  readonly projectPath: string;
  readonly project: Project;
  /** The deck as read from disk, when the project names a deck file. */
  readonly deck: EngineDeck | undefined;
  readonly deckPath: string | undefined;
  /** The mission input for the chosen inlet (default the active one). */
  readonly input: MissionInput;
}

export interface LoadFailure {
  /** The file the problem is in (the project or its deck). */
  readonly file: string;
  readonly issues: readonly ProjectIssue[];
}

function describeFsError(e: unknown): string {
  const code = (e as { code?: string }).code;
  if (code === 'ENOENT') return 'no such file';
  if (code === 'EISDIR') return 'it is a folder, not a file';
  if (code === 'EACCES' || code === 'EPERM') return 'permission denied';
  return e instanceof Error ? e.message : String(e);
}

async function readText(path: string): Promise<Result<string, string>> {
  try {
    return ok(await readFile(path, 'utf8'));
  } catch (e) {
    return err(describeFsError(e));
  }
}

/** Parses a deck file by its extension: `.json` in the JSON deck form, anything else as deck CSV. */
export function parseDeckFile(text: string, sourceName: string): ReturnType<typeof parseDeckCsv> {
  return extname(sourceName).toLowerCase() === '.json' ? parseDeckJson(text, sourceName) : parseDeckCsv(text, sourceName);
}

/** Reads and parses a project file only (no deck). */
export async function readProjectFile(path: string): Promise<Result<{ projectPath: string; project: Project }, LoadFailure>> {
  const projectPath = resolve(path);
  const text = await readText(projectPath);
  if (!text.ok) {
    return err({ file: projectPath, issues: [makeIssue('(file)', '', 'a readable project file', `cannot read ${projectPath}: ${text.error}`)] });
  }
  const parsed = parseProject(text.value, path);
  if (!parsed.ok) return err({ file: projectPath, issues: parsed.error });
  return ok({ projectPath, project: parsed.value });
}

/** Reads the deck file a project names, resolved from the project's folder; undefined when the deck is not a file. */
export async function readProjectDeck(
  projectPath: string,
  project: Project,
): Promise<Result<{ deck: EngineDeck | undefined; deckPath: string | undefined }, LoadFailure>> {
  const ref = deckReference(project);
  if (ref.kind !== 'file') return ok({ deck: undefined, deckPath: undefined });
  const deckPath = resolve(dirname(projectPath), ref.path);
  const text = await readText(deckPath);
  if (!text.ok) {
    return err({
      file: projectPath,
      issues: [makeIssue('engine.deck.path', JSON.stringify(ref.path), 'a readable deck file', `deck file ${JSON.stringify(ref.path)} (${deckPath}) cannot be read: ${text.error}`)],
    });
  }
  const deck = parseDeckFile(text.value, ref.path);
  if (!deck.ok) {
    return err({
      file: deckPath,
      issues: deck.error.map((e) => makeIssue('engine.deck.path', e.value ?? '', e.expected, e.message)),
    });
  }
  return ok({ deck: deck.value, deckPath });
}

/** Reads a project and its deck from disk and builds the mission input (inlet per `options`). */
export async function loadProjectFromDisk(path: string, options: BuildOptions = {}): Promise<Result<LoadedProject, LoadFailure>> {
  const read = await readProjectFile(path);
  if (!read.ok) return read;
  return buildFromProject(read.value.projectPath, read.value.project, options);
}

/** For a project already read from `projectPath`: reads the deck it names and builds the mission input (inlet per `options`). */
export async function buildFromProject(projectPath: string, project: Project, options: BuildOptions = {}): Promise<Result<LoadedProject, LoadFailure>> {
  const deck = await readProjectDeck(projectPath, project);
  if (!deck.ok) return deck;
  const input = buildMissionInput(project, deck.value.deck === undefined ? {} : { deck: deck.value.deck }, options);
  if (!input.ok) return err({ file: projectPath, issues: input.error });
  return ok({ projectPath, project, deck: deck.value.deck, deckPath: deck.value.deckPath, input: input.value });
}

/** The failure as lines for stderr: the file, then one line per issue (path and reason). */
export function formatLoadFailure(failure: LoadFailure): string {
  const lines = [`${failure.file}: cannot use this project (${failure.issues.length} problem${failure.issues.length === 1 ? '' : 's'}):`];
  for (const issue of failure.issues) lines.push(`  ${issue.message}`);
  return `${lines.join('\n')}\n`;
}
