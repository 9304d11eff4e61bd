/** The study state and its dispatch, shared with the views through React context. */
import { createContext, useContext, type Dispatch } from 'react';
import type { StudyAction } from './studyActions';
import type { StudyState } from './studyState';

export interface StudyStore {
  readonly state: StudyState;
  readonly dispatch: Dispatch<StudyAction>;
}

export const StudyContext = createContext<StudyStore | null>(null);

export function useStudy(): StudyStore {
  const store = useContext(StudyContext);
  if (store === null) throw new Error('useStudy outside a StudyContext provider');
  return store;
}
