// Web Worker: runs the framing engine off the main thread so a drag never waits for a recompute.
import { planFrame } from '@/engine';
import type { WorkerRequest, WorkerResponse } from './planner';

const post = (msg: WorkerResponse) => (self as unknown as Worker).postMessage(msg);

self.onmessage = (ev: MessageEvent<WorkerRequest>) => {
  const { id, doc } = ev.data;
  const t0 = performance.now();
  try {
    post({ id, ok: true, plan: planFrame(doc), ms: performance.now() - t0 });
  } catch (e) {
    post({
      id,
      ok: false,
      error: e instanceof Error ? e.message : String(e),
      ms: performance.now() - t0,
    });
  }
};
