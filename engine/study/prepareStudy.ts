/**
 * From texts to a ready study, the one path every front door takes: the
 * project (parsed by the door, engine/project/parseProject.ts) and the text
 * of the deck file it names -> the engine deck, built once -> the mission
 * input of each inlet design, built once on first use. The CLI and the
 * app's worker call this and differ only in how they read files and show
 * failures.
 */
import type { InletPair } from '../analysis/inletFactorBuilder';
import { err, ok, type Result } from '../core/result';
import type { MissionInput } from '../mission/missionTypes';
import { missionInputOnDeck, projectInlet, type MissionOverrides } from '../project/buildMissionInput';
import { cautionSettingsOf, installationOf } from '../project/projectSpecs';
import { embeddedDeckFile, projectDeck } from '../project/projectDeck';
import type { ProjectIssue } from '../project/projectIssue';
import type { Project } from '../project/projectSchema';
import type { DeckFileError } from '../propulsion/deckFileError';
import type { EngineDeck } from '../propulsion/engineDeck';
import { parseDeckText, parseDeckTextMemoized, type DeckFileText, type DeckTextMemo } from './deckText';

/** Why there is no study: the project's issues (JSON paths), or the deck file's errors (lines or JSON paths). */
export type StudyFailure =
  | { readonly kind: 'project'; readonly issues: readonly ProjectIssue[] }
  | { readonly kind: 'deck'; readonly errors: readonly DeckFileError[] };

export type ProjectFailure = Extract<StudyFailure, { readonly kind: 'project' }>;

export interface Study {
  readonly project: Project;
  /** The project's deck (file, embedded or parametric), built once. */
  readonly deck: EngineDeck;
  /** The mission input flying `inletName` (default the active inlet), built once per inlet and kept. */
  inputFor(inletName?: string): Result<MissionInput, ProjectFailure>;
  /** Everything an A-versus-B inlet comparison needs (engine/analysis/inletFactorBuilder.ts), from the inputs built once. */
  inletPair(nameA: string, nameB: string): Result<InletPair, ProjectFailure>;
}

export interface StudyOptions {
  /** Replacements on top of the project's mission, for every inlet. */
  readonly overrides?: MissionOverrides;
  /** Keeps the last deck text parsed (a door that re-prepares after each edit). */
  readonly deckMemo?: DeckTextMemo;
}

/**
 * The study of `project` with `deckFile` (the text of the deck file the
 * project names, or of its engine cycle file, read by the door; ignored for
 * embedded and parametric decks; when null, a file deck's text saved in
 * the project, `engine.deck.text`, is used). A cycle file's deck is generated from it
 * with installation sensitivities, once per text (engine/cycle/cycleDeckCache.ts).
 * A file or cycle deck without its text is a project issue at engine.deck.path.
 */
export function prepareStudy(project: Project, given: DeckFileText | null, options: StudyOptions = {}): Result<Study, StudyFailure> {
  // A deck file saved inside the project stands in for the file when the door read none.
  const deckFile = given ?? embeddedDeckFile(project);
  let fileDeck: EngineDeck | undefined;
  if (project.engine.deck.kind === 'file' && deckFile !== null) {
    const parsed = options.deckMemo ? parseDeckTextMemoized(options.deckMemo, deckFile) : parseDeckText(deckFile.text, deckFile.name);
    if (!parsed.ok) return err({ kind: 'deck', errors: parsed.error });
    fileDeck = parsed.value;
  }
  const cycleText = project.engine.deck.kind === 'cycle' && deckFile !== null ? deckFile.text : undefined;
  const builtDeck = projectDeck(project, fileDeck !== undefined ? { deck: fileDeck } : cycleText !== undefined ? { cycleText } : {});
  if (!builtDeck.ok) return err({ kind: 'project', issues: builtDeck.error });
  const deck = builtDeck.value;
  const built = new Map<string, Result<MissionInput, ProjectFailure>>();
  const overrides = options.overrides;
  function inputFor(inletName?: string): Result<MissionInput, ProjectFailure> {
    const name = inletName ?? project.activeInlet;
    let input = built.get(name);
    if (input === undefined) {
      const r = missionInputOnDeck(project, deck, { inletName: name, ...(overrides === undefined ? {} : { overrides }) });
      input = r.ok ? r : err({ kind: 'project' as const, issues: r.error });
      built.set(name, input);
    }
    return input;
  }
  function inletPair(nameA: string, nameB: string): Result<InletPair, ProjectFailure> {
    const inputA = inputFor(nameA);
    const inputB = inputFor(nameB);
    const inletA = projectInlet(project, nameA);
    const inletB = projectInlet(project, nameB);
    if (!inputA.ok || !inputB.ok || !inletA.ok || !inletB.ok) {
      const issues = [inputA, inputB].flatMap((r) => (r.ok ? [] : r.error.issues));
      return err({ kind: 'project', issues: issues.concat([inletA, inletB].flatMap((r) => (r.ok ? [] : r.error))) });
    }
    return ok({
      inputA: inputA.value,
      inputB: inputB.value,
      inletA: inletA.value,
      inletB: inletB.value,
      deck,
      engineCount: project.engine.count,
      installation: installationOf(project),
      cautionSettings: cautionSettingsOf(project),
    });
  }
  return ok({ project, deck, inputFor, inletPair });
}

/** The failure's lines: one per issue or deck error, each saying where and what. */
export function studyFailureLines(failure: StudyFailure): readonly string[] {
  return failure.kind === 'project' ? failure.issues.map((i) => i.message) : failure.errors.map((e) => e.message);
}
