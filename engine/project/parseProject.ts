/**
 * Reading a `*.blockwise.json` project: JSON text -> format/version check ->
 * migrations -> schema (units to SI) -> cross-field checks. Every problem is
 * a ProjectIssue naming the JSON path, the value and what was expected.
 */
import { err, ok, type Result } from '../core/result';
import { msg } from '../units/messageParts';
import { parseJsonText } from './jsonText';
import { checkProject } from './projectChecks';
import { fromZodIssues, makeIssue, type ProjectIssue } from './projectIssue';
import { migrateProject } from './projectMigrations';
import { projectSchema, type Project } from './projectSchema';

/**
 * Parses project text from `sourceName` (used in messages only). Returns the
 * project with SI numbers, or every issue found (JSON syntax errors carry
 * line and column in `path`).
 */
export function parseProject(text: string, sourceName: string): Result<Project, readonly ProjectIssue[]> {
  const json = parseJsonText(text);
  if (!json.ok) {
    const e = json.error;
    const path = e.code === 'empty' ? '(file)' : `(line ${e.line}, column ${e.column})`;
    const expected = e.code === 'empty' ? 'a JSON object' : 'valid JSON';
    return err([{ path, value: e.code === 'empty' ? '(empty)' : '(invalid JSON)', expected, message: `${sourceName}: ${e.message}` }]);
  }
  return parseProjectData(json.value);
}

/** Same as parseProject for an already-parsed JSON value (e.g. from IPC or the clipboard). */
export function parseProjectData(data: unknown): Result<Project, readonly ProjectIssue[]> {
  const migrated = migrateProject(data);
  if (!migrated.ok) return migrated;
  const { doc, fromVersion } = migrated.value;
  // jitless: a project is parsed once per read; zod's JIT would build and compile a parser function per
  // object shape first (about a tenth of a command-line fly, 2 December 2026), which pays only over many
  // parses of the same shape. The same checks and issues either way (zod's slow path is the one that reports).
  const parsed = projectSchema.safeParse(doc, { jitless: true });
  if (!parsed.success) {
    const issues = fromZodIssues(parsed.error.issues, doc);
    return err(fromVersion === doc.version ? issues : issues.map((i) => noteMigration(i, fromVersion)));
  }
  const issues = checkProject(parsed.data, doc);
  if (issues.length > 0) return err(issues);
  return ok(parsed.data);
}

function noteMigration(issue: ProjectIssue, fromVersion: number): ProjectIssue {
  const note = ` (path as in the current layout; the file is version ${fromVersion})`;
  const noted = makeIssue(issue.path, issue.value, issue.expected, `${issue.message.slice(issue.path.length + 2)}${note}`);
  // A reason carried as message parts keeps its quantities, so a screen still shows them in its own units.
  return issue.reasonParts === undefined ? noted : { ...noted, reasonParts: msg`${issue.reasonParts}${note}` };
}
