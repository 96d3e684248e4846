'use client';
// Products from the firm's catalogue for joists and boards; choosing one sets the specs the engine uses.
import { useEffect, useState } from 'react';
import { setInputs } from '@/canvas/commands/inputs';
import { useEditor, useEditorStore } from '@/canvas/store/EditorStoreProvider';
import { controlClasses } from '@/components/ui/controlClasses';
import { specsFromProducts, type CatalogueProduct } from '@/engine/products';

type ProductLite = CatalogueProduct;

export function ProductsPicker() {
  const store = useEditorStore();
  const doc = useEditor((s) => s.doc);
  const products = doc.products;
  const [error, setError] = useState<string | null>(null);
  const ro = useEditor((s) => s.meta.readOnly);
  const [list, setList] = useState<ProductLite[] | null>(null);
  const [state, setState] = useState<'loading' | 'ready' | 'none'>('loading');

  useEffect(() => {
    let live = true;
    fetch('/api/products?status=active', { cache: 'no-store' })
      .then(async (r) => {
        if (!r.ok) throw new Error(String(r.status));
        const body = (await r.json()) as unknown;
        const items = Array.isArray(body) ? body : ((body as { items?: unknown[] }).items ?? []);
        if (live) {
          setList(items as ProductLite[]);
          setState('ready');
        }
      })
      .catch(() => live && setState('none'));
    return () => {
      live = false;
    };
  }, []);

  if (state === 'none') return null;
  const of = (kind: string) => (list ?? []).filter((p) => p.kind === kind);
  // The product's own figures (maker's span table, stock length, width) become the design's specs.
  const pick = (slot: 'joist' | 'board', id: string) => {
    const next = { ...products, [slot]: id || undefined };
    const product = (list ?? []).find((p) => p.id === id);
    if (!product) {
      store.getState().run(setInputs, { products: next });
      return;
    }
    try {
      const specs = specsFromProducts({ [slot]: product }, doc.codeBasis, doc.joistCentresMm, {
        gapMm: doc.board.gapMm,
        endGapMm: doc.board.endGapMm,
      });
      setError(null);
      if (slot === 'joist' && specs.joist) {
        const { widthMm, depthMm, stockMm, maxSpanMm, maxCantileverMm } = specs.joist;
        store.getState().run(setInputs, {
          products: next,
          joist: { widthMm, depthMm, stockMm, maxSpanMm, maxCantileverMm },
        });
      } else if (slot === 'board' && specs.board) {
        const { widthMm, gapMm, endGapMm, stockMm, maxSpanMm } = specs.board;
        store.getState().run(setInputs, {
          products: next,
          board: { widthMm, gapMm, endGapMm, stockMm, maxSpanMm },
        });
      }
    } catch (e) {
      setError(e instanceof Error ? e.message : 'This product lacks the figures the frame needs');
    }
  };

  return (
    <section aria-labelledby="products-h" className="flex flex-col gap-2">
      <h3 id="products-h" className="text-sm font-bold text-ash-900">
        Products
      </h3>
      {state === 'loading' ? <p className="text-sm text-ash-600">Loading the catalogue…</p> : null}
      {(['joist', 'board'] as const).map((slot) => (
        <label key={slot} className="flex flex-col gap-1 text-sm font-semibold text-ash-800">
          {slot === 'joist' ? 'Joist' : 'Board'}
          <select
            disabled={ro || state !== 'ready'}
            className={controlClasses}
            value={products[slot] ?? ''}
            onChange={(e) => pick(slot, e.target.value)}
          >
            <option value="">Settings below (no product)</option>
            {of(slot).map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </select>
        </label>
      ))}
      {error ? <p className="text-sm font-medium text-clay-700">{error}</p> : null}
      <p className="text-xs text-ash-600">
        Joist: {doc.joist.depthMm} x {doc.joist.widthMm} mm, spans up to {doc.joist.maxSpanMm} mm.
        Board: {doc.board.widthMm} mm wide, {doc.board.stockMm} mm stock.
      </p>
    </section>
  );
}
