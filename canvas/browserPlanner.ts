// The planner the page uses: the engine in a Web Worker (a full recompute of a large deck takes longer
// than a frame), falling back to the main thread where a worker cannot start or load.
import { planFrame } from '@/engine';
import { createSyncPlanner, createWorkerPlanner, type Planner, type PlanResult } from './planner';

export function createBrowserPlanner(): Planner {
  const listeners: ((r: PlanResult) => void)[] = [];
  const emit = (r: PlanResult) => listeners.forEach((l) => l(r));
  let last: Parameters<Planner['request']>[0] | null = null;
  let inner: Planner;

  const fallBackToMainThread = () => {
    inner?.dispose();
    inner = createSyncPlanner(planFrame);
    inner.onResult(emit);
    if (last) inner.request(last);
  };

  try {
    if (typeof Worker === 'undefined') throw new Error('no workers');
    const worker = new Worker(new URL('./engine.worker.ts', import.meta.url), { type: 'module' });
    // WARNING: a worker script that fails to load reports only through this event.
    worker.addEventListener('error', () => fallBackToMainThread());
    inner = createWorkerPlanner(worker);
    inner.onResult(emit);
  } catch {
    fallBackToMainThread();
  }

  return {
    request(doc) {
      last = doc;
      inner.request(doc);
    },
    onResult(cb) {
      listeners.push(cb);
    },
    dispose() {
      inner.dispose();
    },
  };
}
