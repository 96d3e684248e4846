import { describe, expect, it } from 'vitest';
import type { DesignDocument } from '@/engine/schema';
import { setInputs } from '../commands/inputs';
import { moveCorner } from '../commands/outline';
import { makeStore } from '../test-support/fixtures';
import type { DesignApi, SaveOutcome } from './api';
import { startAutosave } from './autosave';

function fakeApi(
  answers: ((body: { version: number; document: DesignDocument }) => SaveOutcome)[],
) {
  const calls: { version: number; document: DesignDocument }[] = [];
  const api: DesignApi = {
    async save(_id, body) {
      calls.push(body);
      const next = answers.shift();
      if (!next) throw new Error('unexpected save');
      return next(body);
    },
    load: async () => {
      throw new Error('not used');
    },
    copy: async () => {
      throw new Error('not used');
    },
  };
  return { api, calls };
}

const saved = (version: number): SaveOutcome => ({
  kind: 'saved',
  design: {
    id: '00000000-0000-4000-8000-000000000001',
    jobId: '00000000-0000-4000-8000-000000000002',
    name: 'Back garden',
    version,
    updatedAt: new Date().toISOString(),
    updatedBy: null,
    document: {} as DesignDocument,
  },
});

function manualTimers() {
  const timers: (() => void)[] = [];
  return {
    timers,
    opts: {
      setTimer: (fn: () => void) => {
        timers.push(fn);
        return fn;
      },
      clearTimer: (t: unknown) => {
        const i = timers.indexOf(t as () => void);
        if (i >= 0) timers.splice(i, 1);
      },
    },
    async fire() {
      const fn = timers.shift();
      fn?.();
      await new Promise((r) => setTimeout(r, 0));
    },
  };
}

describe('autosave', () => {
  it('saves once after a burst of edits with the version last seen, then takes the new version', async () => {
    const store = makeStore();
    const { api, calls } = fakeApi([(b) => saved(b.version + 1)]);
    const t = manualTimers();
    startAutosave(store, api, t.opts);
    store.getState().run(setInputs, { heightMm: 500 });
    store.getState().run(setInputs, { heightMm: 600 });
    expect(store.getState().save.status).toBe('unsaved');
    expect(t.timers).toHaveLength(1);
    await t.fire();
    expect(calls).toHaveLength(1);
    expect(calls[0].version).toBe(3);
    expect(calls[0].document.heightMm).toBe(600);
    expect(store.getState().save).toMatchObject({ status: 'saved', version: 4 });
  });

  it('a stale save puts the editor in conflict and stops saving', async () => {
    const store = makeStore();
    const { api, calls } = fakeApi([
      () => ({
        kind: 'conflict',
        message: 'saved by Harriet Vane',
        current: { version: 5, updatedAt: new Date().toISOString(), updatedBy: null },
      }),
    ]);
    const t = manualTimers();
    startAutosave(store, api, t.opts);
    store.getState().run(setInputs, { heightMm: 500 });
    await t.fire();
    expect(store.getState().save.status).toBe('conflict');
    expect(store.getState().save.conflict?.version).toBe(5);
    store.getState().run(setInputs, { heightMm: 520 });
    await t.fire();
    expect(calls).toHaveLength(1);
  });

  it('goes offline and retries with the same version', async () => {
    const store = makeStore();
    const { api, calls } = fakeApi([
      () => ({ kind: 'offline', message: 'Failed to fetch' }),
      (b) => saved(b.version + 1),
    ]);
    const t = manualTimers();
    startAutosave(store, api, t.opts);
    store.getState().run(setInputs, { heightMm: 500 });
    await t.fire();
    expect(store.getState().save.status).toBe('offline');
    await t.fire();
    expect(calls.map((c) => c.version)).toEqual([3, 3]);
    expect(store.getState().save.status).toBe('saved');
  });

  it('waits for a drag to finish before saving', async () => {
    const store = makeStore();
    const { api, calls } = fakeApi([(b) => saved(b.version + 1)]);
    const t = manualTimers();
    startAutosave(store, api, t.opts);
    store.getState().mark('Move corner');
    store.getState().run(moveCorner, { index: 1, to: [6500, 0] });
    await t.fire();
    expect(calls).toHaveLength(0);
    store.getState().commit();
    await t.fire();
    expect(calls).toHaveLength(1);
  });
});
