/**
 * A worker thread of the analysis pool (analysisPool.ts): prepares each
 * study it is sent once (engine/study), builds each planned mission's input
 * from its job and flies it with the lane's solver (engine/analysis
 * laneSolvers: no time history, one pass memo per lane of a run that shares
 * them), or computes a point task (pointJobOutput), and posts the result back.
 */
import { parentPort } from 'node:worker_threads';
import { analysisJobInput, laneSolvers, pointJobOutput, type AnalysisJobBase } from '../engine/analysis';
import { analysisJobBase, createDeckTextMemo, prepareStudy } from '../engine/study';
import type { PoolReply, PoolRequest } from './analysisProtocol';

const port = parentPort;
if (port === null) throw new Error('analysisWorker.ts runs as a worker thread only');

/** Studies by id (the newest few), each prepared on its first flight. */
const studies = new Map<number, { readonly request: Extract<PoolRequest, { type: 'study' }>; base?: AnalysisJobBase | string }>();
const KEPT_STUDIES = 4;
const deckMemo = createDeckTextMemo();
const runs = new Map<number, ReturnType<typeof laneSolvers>>();

function baseOf(studyId: number): AnalysisJobBase | string {
  const s = studies.get(studyId);
  if (s === undefined) return `study ${studyId} was not sent`;
  if (s.base === undefined) {
    const study = prepareStudy(s.request.source.project, s.request.source.deckFile, { deckMemo });
    const base = study.ok ? analysisJobBase(study.value, s.request.spec) : study;
    s.base = base.ok ? base.value : 'the study could not be prepared';
  }
  return s.base;
}

port.on('message', (m: PoolRequest) => {
  if (m.type === 'study') {
    studies.set(m.studyId, { request: m });
    for (const id of studies.keys()) if (studies.size > KEPT_STUDIES) studies.delete(id);
    return;
  }
  if (m.type === 'endRun') {
    runs.delete(m.runId);
    return;
  }
  const base = baseOf(m.studyId);
  if (m.type === 'points') {
    const output = typeof base === 'string' ? null : pointJobOutput(base, m.job);
    port.postMessage(
      output === null
        ? ({ type: 'refused', runId: m.runId, index: m.index, message: typeof base === 'string' ? base : `point task ${m.job.kind} does not belong to the study's analysis` } satisfies PoolReply)
        : ({ type: 'computed', runId: m.runId, index: m.index, output } satisfies PoolReply),
    );
    return;
  }
  const input = typeof base === 'string' ? null : analysisJobInput(base, m.job);
  if (input === null) {
    port.postMessage({ type: 'refused', runId: m.runId, index: m.index, message: typeof base === 'string' ? base : `job ${m.job.kind} does not belong to the study's analysis` } satisfies PoolReply);
    return;
  }
  let lanes = runs.get(m.runId);
  if (lanes === undefined) runs.set(m.runId, (lanes = laneSolvers()));
  const result = lanes.solverFor(m.laneMemos, m.lane)(input, m.start);
  port.postMessage({ type: 'flown', runId: m.runId, index: m.index, result } satisfies PoolReply);
});
