/** The demo study as the worker tests need it: its inputs (project + deck file) and the mission input of the active inlet. */
import type { MissionInput } from '../../../engine/mission';
import { parseProject } from '../../../engine/project/parseProject';
import { prepareStudy } from '../../../engine/study';
import type { StudyInputs } from '../../../renderer/worker/engineProtocol';
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
