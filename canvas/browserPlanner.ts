// The planner the page uses: the engine in a Web Worker (a full recompute of a large deck takes longer
// than a frame), or on the main thread where workers are unavailable.
import { planFrame } from '@/engine';
import { createSyncPlanner, createWorkerPlanner, type Planner } from './planner';

export function createBrowserPlanner(): Planner {
  if (typeof Worker !== 'undefined') {
    try {
      const worker = new Worker(new URL('./engine.worker.ts', import.meta.url), { type: 'module' });
      return createWorkerPlanner(worker);
    } catch {
      // fall through to the main thread
    }
  }
  return createSyncPlanner(planFrame);
}
