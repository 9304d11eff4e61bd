/**
 * The CLI's door to a study: reads the project file and the deck file it
 * names from disk (the engine reads no files) and hands the texts to
 * engine/study, which parses the deck (by content), builds it once and the
 * mission input of each inlet. Relative deck paths resolve from the project
 * file's folder.
 */
import { dirname, resolve } from 'node:path';
import { err, ok, type Result } from '../engine/core';
import { readTextFileSync } from '../hostio/textFile';
import type { MissionInput } from '../engine/mission';
import { type BuildOptions, deckReference, embeddedDeckFile, makeIssue, parseProject, type Project, type ProjectIssue } from '../engine/project';
import type { EngineDeck } from '../engine/propulsion';
import { cannotReadMessage, prepareStudy, type DeckFileText, type Study } from '../engine/study';

export interface LoadedProject {
  /** Absolute path of the project file. */
  readonly projectPath: string;
  readonly project: Project;
  /** The project's deck (file, embedded or parametric), built once. */
  readonly deck: EngineDeck;
  /** Absolute path of the deck file, when the project names one. */
  readonly deckPath: string | undefined;
  /** The study: the mission input of any inlet, built once per inlet. */
  readonly study: Study;
  /** The mission input for the chosen inlet (default the active one). */
  readonly input: MissionInput;
}

export interface LoadFailure {
  /** The file the problem is in (the project or its deck). */
  readonly file: string;
  readonly issues: readonly ProjectIssue[];
}

/**
 * The file's text through the one safe reader (hostio/textFile.ts), or the reason it cannot be read. Read
 * synchronously, as the other verbs' files are: a command line has nothing to do meanwhile, and the promise
 * reader's six round trips to the thread pool per file (and its first FileHandle) cost a start several ms.
 */
function readText(path: string): Result<string, string> {
  const read = readTextFileSync(path);
  return read.ok ? ok(read.value.text) : err(read.error.reason);
}

/** Reads and parses a project file only (no deck). */
export async function readProjectFile(path: string): Promise<Result<{ projectPath: string; project: Project }, LoadFailure>> {
  const projectPath = resolve(path);
  const text = readText(projectPath);
  if (!text.ok) {
    return err({ file: projectPath, issues: [makeIssue('(file)', '', 'a readable project file', cannotReadMessage(projectPath, text.error))] });
  }
  const parsed = parseProject(text.value, path);
  if (!parsed.ok) return err({ file: projectPath, issues: parsed.error });
  return ok({ projectPath, project: parsed.value });
}

/**
 * Reads the text of the deck file (or engine cycle file) a project names,
 * resolved from the project's folder; null when the deck is neither.
 */
async function readProjectDeckText(projectPath: string, project: Project): Promise<Result<{ file: DeckFileText; deckPath: string } | null, LoadFailure>> {
  const ref = deckReference(project);
  if (ref.kind !== 'file' && ref.kind !== 'cycle') return ok(null);
  // A deck saved inside the project is used as saved; the file beside it is not read.
  const embedded = embeddedDeckFile(project);
  if (embedded !== null) return ok({ file: embedded, deckPath: projectPath });
  const deckPath = resolve(dirname(projectPath), ref.path);
  const what = ref.kind === 'cycle' ? 'cycle file' : 'deck file';
  const text = readText(deckPath);
  if (!text.ok) {
    return err({
      file: projectPath,
      issues: [makeIssue('engine.deck.path', JSON.stringify(ref.path), `a readable ${what}`, `${what} ${JSON.stringify(ref.path)}: ${cannotReadMessage(deckPath, text.error)}`)],
    });
  }
  return ok({ file: { name: ref.path, text: text.value }, deckPath });
}

/** Reads a project and its deck from disk and builds the mission input (inlet per `options`). */
export async function loadProjectFromDisk(path: string, options: BuildOptions = {}): Promise<Result<LoadedProject, LoadFailure>> {
  const read = await readProjectFile(path);
  if (!read.ok) return read;
  return buildFromProject(read.value.projectPath, read.value.project, options);
}

/** For a project already read from `projectPath`: reads the deck it names and prepares the study (inlet per `options`). */
export async function buildFromProject(projectPath: string, project: Project, options: BuildOptions = {}): Promise<Result<LoadedProject, LoadFailure>> {
  const deckText = await readProjectDeckText(projectPath, project);
  if (!deckText.ok) return deckText;
  const deckPath = deckText.value?.deckPath;
  const study = prepareStudy(project, deckText.value?.file ?? null, options.overrides === undefined ? {} : { overrides: options.overrides });
  if (!study.ok) {
    const failure = study.error;
    if (failure.kind === 'project') return err({ file: projectPath, issues: failure.issues });
    return err({ file: deckPath ?? projectPath, issues: failure.errors.map((e) => makeIssue('engine.deck.path', e.value ?? '', e.expected, e.message)) });
  }
  const input = study.value.inputFor(options.inletName);
  if (!input.ok) return err({ file: projectPath, issues: input.error.issues });
  return ok({ projectPath, project, deck: study.value.deck, deckPath, study: study.value, input: input.value });
}

/** The failure as lines for stderr: the file, then one line per issue (path and reason). */
export function formatLoadFailure(failure: LoadFailure): string {
  const lines = [`${failure.file}: cannot use this project (${failure.issues.length} problem${failure.issues.length === 1 ? '' : 's'}):`];
  for (const issue of failure.issues) lines.push(`  ${issue.message}`);
  return `${lines.join('\n')}\n`;
}
