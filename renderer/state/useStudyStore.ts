/** The study store as a React reducer hook. */
import { useReducer } from 'react';
import type { StudyStore } from './studyContext';
import { studyReducer } from './studyReducer';
import { emptyStudy } from './studyState';

export function useStudyStore(): StudyStore {
  const [state, dispatch] = useReducer(studyReducer, undefined, emptyStudy);
  return { state, dispatch };
}
