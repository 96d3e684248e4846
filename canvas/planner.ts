// Turns documents into frame plans off the input path: coalesces requests (latest wins), on the main
// thread after the current event or in a Web Worker.
import type { DesignDocument } from '@/engine/schema';
import type { FramePlan } from '@/engine/types';

/** Where the engine ran: in the Web Worker or on the page's own thread. */
export type PlanVia = 'worker' | 'main';

export type PlanResult =
  | { ok: true; doc: DesignDocument; plan: FramePlan; ms: number; via: PlanVia }
  | { ok: false; doc: DesignDocument; error: string; ms: number; via: PlanVia };

export interface Planner {
  request(doc: DesignDocument): void;
  onResult(cb: (r: PlanResult) => void): void;
  dispose(): void;
}

export type PlanFn = (doc: DesignDocument) => FramePlan;

const now = () => (typeof performance !== 'undefined' ? performance.now() : Date.now());

/** Runs a plan function and reports the outcome (an engine error is a result, not a crash). */
export function runPlan(planFrame: PlanFn, doc: DesignDocument): PlanResult {
  const t0 = now();
  try {
    const plan = planFrame(doc);
    return { ok: true, doc, plan, ms: now() - t0, via: 'main' };
  } catch (e) {
    const error = e instanceof Error ? e.message : String(e);
    return { ok: false, doc, error, ms: now() - t0, via: 'main' };
  }
}

/**
 * Main-thread planner: the engine runs once per scheduled tick with the latest document, so a burst
 * of pointer moves costs one recompute. `schedule` defaults to the next animation frame.
 */
export function createSyncPlanner(
  planFrame: PlanFn,
  schedule: (fn: () => void) => void = (fn) =>
    typeof requestAnimationFrame === 'function'
      ? requestAnimationFrame(() => fn())
      : setTimeout(fn, 0),
): Planner {
  let latest: DesignDocument | null = null;
  let scheduled = false;
  let disposed = false;
  const listeners: ((r: PlanResult) => void)[] = [];
  const flush = () => {
    scheduled = false;
    if (disposed || !latest) return;
    const doc = latest;
    latest = null;
    const r = runPlan(planFrame, doc);
    for (const l of listeners) l(r);
  };
  return {
    request(doc) {
      latest = doc;
      if (!scheduled) {
        scheduled = true;
        schedule(flush);
      }
    },
    onResult(cb) {
      listeners.push(cb);
    },
    dispose() {
      disposed = true;
    },
  };
}

/** Messages between the page and canvas/engine.worker.ts. */
export type WorkerRequest = { id: number; doc: DesignDocument };
export type WorkerResponse =
  | { id: number; ok: true; plan: FramePlan; ms: number }
  | { id: number; ok: false; error: string; ms: number };

/** Worker planner: one request in flight; newer documents replace any waiting one (latest wins). */
export function createWorkerPlanner(worker: Worker): Planner {
  const listeners: ((r: PlanResult) => void)[] = [];
  let seq = 0;
  let inFlight: { id: number; doc: DesignDocument } | null = null;
  let waiting: DesignDocument | null = null;
  const send = (doc: DesignDocument) => {
    inFlight = { id: ++seq, doc };
    worker.postMessage({ id: inFlight.id, doc } satisfies WorkerRequest);
  };
  worker.onmessage = (ev: MessageEvent<WorkerResponse>) => {
    const msg = ev.data;
    if (!inFlight || msg.id !== inFlight.id) return;
    const doc = inFlight.doc;
    inFlight = null;
    const r: PlanResult = msg.ok
      ? { ok: true, doc, plan: msg.plan, ms: msg.ms, via: 'worker' }
      : { ok: false, doc, error: msg.error, ms: msg.ms, via: 'worker' };
    for (const l of listeners) l(r);
    if (waiting) {
      const next = waiting;
      waiting = null;
      send(next);
    }
  };
  return {
    request(doc) {
      if (inFlight) waiting = doc;
      else send(doc);
    },
    onResult(cb) {
      listeners.push(cb);
    },
    dispose() {
      worker.terminate();
    },
  };
}
