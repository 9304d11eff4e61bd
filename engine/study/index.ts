/**
 * engine/study: the one pure path from texts to a ready study and from
 * results to files, shared by the CLI, the app's worker and the desktop
 * shell (docs/style.md §5b). Other layers import this file, not its modules.
 */
export { deckTextFormat, parseDeckText, createDeckTextMemo, type DeckFileText, type DeckTextFormat, type DeckTextMemo } from './deckText';
export { prepareStudy, studyFailureLines, type ProjectFailure, type Study, type StudyFailure, type StudyOptions } from './prepareStudy';
export { cannotReadMessage, readFailureReason } from './readProblem';
export { fileStem, HISTORY_COLUMNS, historyCsv, legsCsv, type CsvUnits } from './resultsCsv';
export { prepareSweep, type SweepStudy, type SweepStudyOptions } from './prepareSweep';
