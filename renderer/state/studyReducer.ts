/**
 * The pure reducer of the study. Every document edit goes through
 * applyEdit (immer produceWithPatches) so it can be undone by its inverse
 * patches; a field whose text does not parse, or that breaks one of the
 * project's rules at that field, is kept as a draft with its message and
 * never reaches the document.
 */
import type { Draft } from 'immer';
import type { Project } from '../../engine/project';
import { isCycleFileName } from './documentActions';
import { issueReason } from './displayText';
import { parseField } from './fieldUnits';
import { LEG_KIND_LABEL, newLeg } from './legTemplates';
import { pathText, readAt, writeAtMutating } from './projectPath';
import { projectIssues } from './projectValidation';
import type { StudyAction } from './studyActions';
import type { StudyState } from './studyState';
import { applyEdit, redo, startHistory, undo, type Undoable } from './undoHistory';
import { NAUTICAL_MILE_M } from '../../engine/units';

function withoutDraft(drafts: StudyState['drafts'], key: string): StudyState['drafts'] {
  if (!(key in drafts)) return drafts;
  const next = { ...drafts };
  delete next[key];
  return next;
}

function edited(state: StudyState, label: string, recipe: (draft: Draft<Project>) => void): StudyState {
  if (state.doc === null) return state;
  const doc = applyEdit(state.doc, label, recipe);
  if (doc === state.doc) return state;
  return { ...state, doc, issues: projectIssues(doc.present) };
}

function cloneRow(row: unknown): unknown {
  return JSON.parse(JSON.stringify(row)) as unknown;
}

function fieldEdited(state: StudyState, action: Extract<StudyAction, { type: 'fieldEdited' }>): StudyState {
  if (state.doc === null) return state;
  const key = pathText(action.path);
  const parsed = parseField(action.text, action.unit, state.units);
  if (!parsed.ok) {
    return { ...state, drafts: { ...state.drafts, [key]: { text: action.text, message: parsed.error } } };
  }
  const trial: Undoable<Project> = applyEdit(state.doc, action.label, (d) => writeAtMutating(d, action.path, parsed.value));
  const issues = trial === state.doc ? state.issues : projectIssues(trial.present);
  const atField = issues.find((i) => i.path === key);
  if (atField) {
    return { ...state, drafts: { ...state.drafts, [key]: { text: action.text, message: issueReason(atField, state.units) } } };
  }
  return { ...state, doc: trial, issues, drafts: withoutDraft(state.drafts, key) };
}

/** The next state after `action`; `state` is never changed. */
export function studyReducer(state: StudyState, action: StudyAction): StudyState {
  switch (action.type) {
    case 'projectOpened':
      return {
        ...state,
        doc: startHistory(action.project),
        documentName: action.name,
        documentKey: state.documentKey + 1,
        deckFile: action.deckFile,
        drafts: {},
        issues: projectIssues(action.project),
        openIssues: [],
        savedAtStep: action.unsaved === true ? null : 0,
        highlight: null,
        embedDeck: action.embedDeck === true ? true : null,
      };
    case 'projectOpenFailed':
      return { ...state, openIssues: action.issues };
    case 'deckImported': {
      // One step for the deck text and the project's reference together: undo restores both.
      if (state.doc === null) return state;
      const companion = { deckBefore: state.deckFile, deckAfter: action.deckFile };
      const doc = applyEdit(state.doc, `Import deck ${action.deckFile.name}`, (d) => {
        if (isCycleFileName(action.deckFile.name)) {
          // A cycle file: the engine is that cycle; a grid already set for a cycle engine is kept.
          const grid = d.engine.deck.kind === 'cycle' ? d.engine.deck.grid : undefined;
          d.engine.deck = { kind: 'cycle', path: action.deckFile.name, ...(grid === undefined ? {} : { grid }) };
        } else d.engine.deck = { kind: 'file', path: action.deckFile.name };
      }, companion);
      return { ...state, doc, deckFile: action.deckFile, issues: projectIssues(doc.present) };
    }
    case 'fieldEdited':
      return fieldEdited(state, action);
    case 'valueSet': {
      const next = edited(state, action.label, (d) => writeAtMutating(d, action.path, action.value));
      return { ...next, drafts: withoutDraft(next.drafts, pathText(action.path)) };
    }
    case 'rowAdded':
      return edited(state, action.label, (d) => {
        const rows = readAt(d, action.path);
        if (!Array.isArray(rows) || rows.length === 0) throw new Error(`rowAdded: no rows at ${pathText(action.path)}`);
        rows.push(cloneRow(rows[rows.length - 1]));
      });
    case 'rowRemoved':
      return edited(state, action.label, (d) => {
        const rows = readAt(d, action.path);
        if (!Array.isArray(rows)) throw new Error(`rowRemoved: no rows at ${pathText(action.path)}`);
        if (rows.length > 1 && action.index >= 0 && action.index < rows.length) rows.splice(action.index, 1);
      });
    case 'legAdded':
      return edited(state, `Add ${action.kind} leg`, (d) => {
        // New legs are named ("Cruise 2"), so messages and the legs table can say which one.
        const count = d.mission.legs.filter((l) => l.kind === action.kind).length + 1;
        d.mission.legs.push({ ...newLeg(action.kind), name: `${LEG_KIND_LABEL[action.kind]} ${count}` });
      });
    case 'legRemoved':
      return edited(state, `Remove leg ${action.index + 1}`, (d) => {
        if (d.mission.legs.length > 1 && action.index < d.mission.legs.length) d.mission.legs.splice(action.index, 1);
      });
    case 'legDuplicated':
      return edited(state, `Duplicate leg ${action.index + 1}`, (d) => {
        const leg = d.mission.legs[action.index];
        if (!leg) return;
        const copy = cloneRow(leg) as typeof leg;
        copy.name = `${leg.name ?? LEG_KIND_LABEL[leg.kind]} (copy)`;
        // Only one cruise may have its distance solved: the copy of that cruise flies a set distance, so the project stays flyable.
        if (copy.kind === 'cruise' && copy.distance === 'solve') copy.distance = 500 * NAUTICAL_MILE_M;
        d.mission.legs.splice(action.index + 1, 0, copy);
      });
    case 'legMoved':
      return edited(state, `Move leg ${action.index + 1}`, (d) => {
        const to = action.index + action.by;
        const legs = d.mission.legs;
        if (action.index < 0 || action.index >= legs.length || to < 0 || to >= legs.length) return;
        const [leg] = legs.splice(action.index, 1);
        legs.splice(to, 0, leg!);
      });
    case 'legReplaced':
      return edited(state, `Change leg ${action.index + 1}`, (d) => {
        d.mission.legs[action.index] = action.leg as (typeof d.mission.legs)[number];
      });
    case 'draftDiscarded':
      return { ...state, drafts: withoutDraft(state.drafts, pathText(action.path)) };
    case 'undo':
    case 'redo': {
      if (state.doc === null) return state;
      const step = action.type === 'undo' ? state.doc.past.at(-1) : state.doc.future.at(-1);
      const doc = action.type === 'undo' ? undo(state.doc) : redo(state.doc);
      if (doc === state.doc) return state;
      const companion = step?.companion;
      const deckFile = companion === undefined ? state.deckFile : action.type === 'undo' ? companion.deckBefore : companion.deckAfter;
      return { ...state, doc, deckFile, drafts: {}, issues: projectIssues(doc.present) };
    }
    case 'unitsChosen':
      return { ...state, units: action.units, drafts: {} };
    case 'highlighted':
      return { ...state, highlight: action.highlight };
    case 'embedDeckChosen':
      return { ...state, embedDeck: action.embed };
    case 'saved':
      return state.doc === null ? state : { ...state, savedAtStep: state.doc.past.length };
  }
}
