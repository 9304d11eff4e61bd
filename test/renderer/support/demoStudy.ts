/** The demo study as the tests need it: its inputs and mission input (worker tests), or a project flown to the snapshot the app shows. */
import type { MissionInput } from '../../../engine/mission';
import { parseProject } from '../../../engine/project/parseProject';
import { prepareStudy } from '../../../engine/study';
import type { StudyInputs, StudySnapshot } from '../../../renderer/worker/engineProtocol';
import { createDeckCache, runEngineRequest } from '../../../renderer/worker/engineRunner';
import { demoFiles } from './fakeBridge';

export function demoStudy(): { readonly demo: StudyInputs; readonly input: MissionInput } {
  const d = demoFiles();
  const p = parseProject(d.projectText, d.projectName);
  if (!p.ok) throw new Error(JSON.stringify(p.error));
  const demo = { project: p.value, deckFile: { name: d.deckName, text: d.deckText } };
  const s = prepareStudy(demo.project, demo.deckFile);
  if (!s.ok) throw new Error(JSON.stringify(s.error));
  const i = s.value.inputFor();
  if (!i.ok) throw new Error(JSON.stringify(i.error));
  return { demo, input: i.value };
}

/** The live study's snapshot for `inputs` (the one the app's worker sends), flown in this thread; throws when it fails. */
export function flyStudy(inputs: StudyInputs): StudySnapshot {
  const r = runEngineRequest({ kind: 'study', ...inputs }, createDeckCache());
  if (!r.ok) throw new Error(JSON.stringify(r.error));
  return r.value as StudySnapshot;
}
