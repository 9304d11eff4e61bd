/**
 * A worker thread of `blockwise sweep`: started before its study is known (cli/sweep/sweepPool.ts startSweepCrew, so
 * its own start-up runs while the main thread reads the project), it prepares the study from its first message
 * (engine/study/prepareSweep.ts: the project parsed, the deck and the installed model built once, each case's fuel
 * iteration started from its neighbour's), then flies the chunks of cases the main thread sends, replying with rows in
 * small batches so the main thread can write them as they come.
 */
import { parentPort } from 'node:worker_threads';
import type { SweepRow } from '../../engine/project';
import { prepareSweep, type SweepStudy } from '../../engine/study';
import type { SweepReply, SweepRequest } from './sweepProtocol';

/** Rows per reply: few enough messages, rows still written within about a tenth of a second. */
const BATCH = 16;

const port = parentPort;
if (port === null) throw new Error('sweepWorker.ts runs as a worker thread only');

let study: SweepStudy | null = null;
port.on('message', (request: SweepRequest) => {
  const post = (reply: SweepReply) => port.postMessage(reply);
  if (request.kind === 'study') {
    const data = request.data;
    study = prepareSweep(data.doc, data.axes, data.deck === undefined ? {} : { deck: data.deck }, data.inletName);
    return;
  }
  if (study === null) {
    post({ kind: 'error', message: 'a chunk of cases came before the study' });
    return;
  }
  let rows: SweepRow[] = [];
  for (let k = request.start; k < request.end; k++) {
    rows.push(study.fly(k));
    if (rows.length >= BATCH && k + 1 < request.end) {
      post({ kind: 'rows', rows, chunkDone: false });
      rows = [];
    }
  }
  post({ kind: 'rows', rows, chunkDone: true });
});
