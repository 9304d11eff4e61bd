/** Validates an edited project exactly as a saved file would be read back. */
import { parseProjectData, type Project, type ProjectIssue, projectToJson } from '../../engine/project';

/** Every issue the project would have if saved and reopened (empty when valid). */
export function projectIssues(project: Project): readonly ProjectIssue[] {
  const parsed = parseProjectData(JSON.parse(projectToJson(project)) as unknown);
  return parsed.ok ? [] : parsed.error;
}
