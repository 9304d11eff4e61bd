/**
 * A worker thread of `blockwise sweep`: prepares the study once (engine/study/prepareSweep.ts: the project parsed,
 * the deck and the installed model built once, each case's fuel iteration started from its neighbour's), then flies
 * the chunks of cases the main thread sends, replying with rows in small batches so the main thread can write them
 * as they come.
 */
import { parentPort, workerData } from 'node:worker_threads';
import type { SweepRow } from '../../engine/project';
import { prepareSweep } from '../../engine/study';
import type { SweepChunk, SweepReply, SweepWorkerData } from './sweepProtocol';

/** Rows per reply: few enough messages, rows still written within about a tenth of a second. */
const BATCH = 16;

const data = workerData as SweepWorkerData;
const port = parentPort;
if (port === null) throw new Error('sweepWorker.ts runs as a worker thread only');

const study = prepareSweep(data.doc, data.axes, data.deck === undefined ? {} : { deck: data.deck }, data.inletName);

port.on('message', (chunk: SweepChunk) => {
  const post = (reply: SweepReply) => port.postMessage(reply);
  let rows: SweepRow[] = [];
  for (let k = chunk.start; k < chunk.end; k++) {
    rows.push(study.fly(k));
    if (rows.length >= BATCH && k + 1 < chunk.end) {
      post({ kind: 'rows', rows, chunkDone: false });
      rows = [];
    }
  }
  post({ kind: 'rows', rows, chunkDone: true });
});
