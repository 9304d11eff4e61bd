/**
 * The records the segments of one solve write their evaluations into: a solve flies one segment at a time, and an
 * integrator reads an evaluation or a stage before the segment's next call and copies what it keeps across calls
 * (Segment.evaluate, Segment.derivative), so every segment of the solve can share one set; and the monotone
 * stepper's stage scratch, written and read within each of its steps.
 */
import { newDragSample, type DragSample } from '../aero/aeroModel';
import { newSampleRecord, type SampleRecord } from './flightPoint';
import { newMonotoneScratch, type MonotoneScratch } from './monotoneStepper';
import { STATE_SIZE } from './missionState';
import type { MissionContext } from './missionContext';

export interface SegmentBuffers {
  /** The drag of the point evaluated. */
  readonly drag: DragSample;
  /** An accepted point's derivative (Segment.evaluate), every entry written at each evaluation. */
  readonly rates: Float64Array<ArrayBuffer>;
  /** An RK4 stage's derivative (Segment.derivative), every entry written at each stage. */
  readonly stage: Float64Array<ArrayBuffer>;
  /** An accepted point's sample. */
  readonly point: SampleRecord;
  /** The monotone stepper's stage point and slopes (flySegment.ts flyMonotoneSegment). */
  readonly monotone: MonotoneScratch;
}

export function newSegmentBuffers(): SegmentBuffers {
  return { drag: newDragSample(), rates: new Float64Array(STATE_SIZE), stage: new Float64Array(STATE_SIZE), point: newSampleRecord(), monotone: newMonotoneScratch() };
}

/** The context's shared buffers, or a set of the segment's own where the context has none. */
export function segmentBuffers(ctx: MissionContext): SegmentBuffers {
  return ctx.buffers ?? newSegmentBuffers();
}
