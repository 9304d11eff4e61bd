/**
 * engine/core's public surface (hand-written; docs/style.md §5): the Result
 * shape every layer returns and the safety notice every output carries.
 */
export { err, expectOk, ok, type Err, type Ok, type Result } from './result';
export { noticeCsvComment, SAFETY_NOTICE, SAFETY_NOTICE_LINES } from './notice';
