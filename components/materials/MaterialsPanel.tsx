'use client';
// The priced materials list of a design, grouped for ordering, with the waste allowance and the
// crew's downloads (CSV, framing plan PDF). Given the editor's live plan it prices that as you edit;
// otherwise it asks the server to price the saved design.
import { useQuery } from '@tanstack/react-query';
import { useSession } from 'next-auth/react';
import { useId, useMemo, useState } from 'react';
import type { DesignDocument } from '@/engine/schema';
import { priceTakeOff, type PricedProduct, type PricedTakeOff } from '@/engine/takeoff/price';
import type { FramePlan } from '@/engine/types';
import { DEFAULT_WASTE_PCT, materialsQuerySchema, materialsUrl, planUrl } from '@/lib/pdf/requests';
import { formatLength, type UnitSystem } from '@/lib/units';
import { buttonClasses } from '@/components/ui/buttonClasses';
import { fetchJson } from '@/components/ui/fetchJson';
import { SafetyNotice } from '@/components/ui/SafetyNotice';
import { formatMoney, groupLines, quantityText } from './materialsTable';

export interface MaterialsPanelProps {
  designId: string;
  /** The editor's live frame plan: when given, the table follows every edit. */
  plan?: FramePlan;
  /** The editor's live document (its product choices price the lines). */
  document?: DesignDocument;
  /** Display units; defaults to the signed-in user's choice. */
  units?: UnitSystem;
}

interface CatalogueRow {
  id: string;
  kind: string;
  name: string;
  unit: string;
  unitPrice: number;
  stockLengthsMm: number[];
  dimensions: Record<string, unknown>;
}

function useLivePricing(
  plan: FramePlan | undefined,
  document: DesignDocument | undefined,
  wastePct: number | null,
) {
  const live = !!plan && !!document;
  const products = useQuery({
    queryKey: ['products', 'active'],
    queryFn: () => fetchJson<CatalogueRow[]>('/api/products?status=active'),
    enabled: live,
  });
  const firm = useQuery({
    queryKey: ['firm'],
    queryFn: () => fetchJson<{ firm: { currency: string } }>('/api/firm'),
    enabled: live,
  });
  const priced = useMemo<PricedTakeOff | undefined>(() => {
    if (!live || !products.data || !firm.data || wastePct === null) return undefined;
    const currency = firm.data.firm.currency;
    const catalogue: PricedProduct[] = products.data.map((p) => ({ ...p, currency }));
    return priceTakeOff(plan!.quantities, catalogue, {
      wastePct,
      choices: document!.products,
      currency,
    });
  }, [live, products.data, firm.data, plan, document, wastePct]);
  return {
    live,
    priced,
    error: products.error ?? firm.error,
    loading: products.isPending || firm.isPending,
  };
}

export function MaterialsPanel({
  designId,
  plan,
  document,
  units: unitsProp,
}: MaterialsPanelProps) {
  const session = useSession();
  const units: UnitSystem = unitsProp ?? session.data?.user?.units ?? 'metric';
  const wasteId = useId();
  const [wasteText, setWasteText] = useState(String(DEFAULT_WASTE_PCT));
  const parsedWaste = materialsQuerySchema.shape.wastePct.safeParse(
    wasteText.trim() === '' ? undefined : wasteText,
  );
  const wastePct = parsedWaste.success ? parsedWaste.data : null;
  // Keep the last good figure for the downloads while the field holds something unusable.
  const [lastGoodWaste, setLastGoodWaste] = useState(DEFAULT_WASTE_PCT);
  if (wastePct !== null && wastePct !== lastGoodWaste) setLastGoodWaste(wastePct);

  const livePricing = useLivePricing(plan, document, wastePct);
  const saved = useQuery({
    queryKey: ['materials', designId, lastGoodWaste],
    queryFn: () => fetchJson<PricedTakeOff>(materialsUrl(designId, { wastePct: lastGoodWaste })),
    enabled: !livePricing.live,
    placeholderData: (prev) => prev,
  });
  const priced = livePricing.live ? livePricing.priced : saved.data;
  const error = livePricing.live ? livePricing.error : saved.error;
  const loading = livePricing.live ? livePricing.loading : saved.isPending;
  const groups = useMemo(() => (priced ? groupLines(priced.lines) : []), [priced]);
  const money = (x: number) => formatMoney(x, priced?.currency ?? 'GBP');

  return (
    <section
      aria-labelledby={`${wasteId}-title`}
      className="flex flex-col gap-4"
      data-testid="materials-panel"
    >
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h2 id={`${wasteId}-title`} className="text-lg font-bold text-ash-950">
          Materials
        </h2>
        <div className="flex flex-col gap-1">
          <label htmlFor={wasteId} className="text-sm font-semibold text-ash-800">
            Waste allowance (%)
          </label>
          <input
            id={wasteId}
            inputMode="decimal"
            className="min-h-11 w-28 rounded-lg border border-ash-300 px-3 text-right"
            value={wasteText}
            aria-invalid={wastePct === null}
            aria-describedby={`${wasteId}-help`}
            onChange={(e) => setWasteText(e.target.value)}
          />
          <p
            id={`${wasteId}-help`}
            className={`text-xs ${wastePct === null ? 'text-clay-700' : 'text-ash-600'}`}
          >
            {parsedWaste.success
              ? 'On counted items; cut-list lengths already carry their offcuts.'
              : (parsedWaste.error.issues[0]?.message ?? 'Enter a percentage from 0 to 100')}
          </p>
        </div>
      </div>

      {error ? (
        <p
          role="status"
          className="rounded-lg border border-clay-200 bg-clay-50 p-3 text-sm text-clay-800"
        >
          The materials could not be priced: {error.message}
        </p>
      ) : null}
      {loading && !priced ? <p className="text-sm text-ash-600">Pricing the materials…</p> : null}

      {priced ? (
        <div className="overflow-x-auto">
          <table
            className="w-full min-w-[36rem] border-collapse text-sm"
            data-testid="materials-table"
          >
            <thead>
              <tr className="border-b border-ash-300 text-left text-ash-700">
                <th scope="col" className="py-2 pr-3 font-semibold">
                  Item
                </th>
                <th scope="col" className="py-2 pr-3 text-right font-semibold">
                  Needed
                </th>
                <th scope="col" className="py-2 pr-3 font-semibold">
                  Product
                </th>
                <th scope="col" className="py-2 pr-3 text-right font-semibold">
                  Buy
                </th>
                <th scope="col" className="py-2 pr-3 text-right font-semibold">
                  Price
                </th>
                <th scope="col" className="py-2 text-right font-semibold">
                  Amount
                </th>
              </tr>
            </thead>
            {groups.map((g) => (
              <tbody key={g.group} data-group={g.group}>
                <tr className="bg-ash-50">
                  <th
                    scope="rowgroup"
                    colSpan={5}
                    className="py-1.5 pl-2 text-left font-bold text-ash-900"
                  >
                    {g.title}
                  </th>
                  <td className="py-1.5 text-right font-semibold text-ash-900">
                    {money(g.amount)}
                  </td>
                </tr>
                {g.lines.map((l) => (
                  <tr key={l.key} className="border-b border-ash-100 align-top">
                    <td className="py-1.5 pr-3 pl-2" title={l.basis}>
                      {l.label}
                      {l.stockMm ? (
                        <span className="text-ash-600">
                          {' '}
                          · {formatLength(l.stockMm, units, { metricAs: 'm' })}
                        </span>
                      ) : null}
                    </td>
                    <td className="py-1.5 pr-3 text-right tabular-nums">
                      {quantityText(l.qty, l.unit)}
                    </td>
                    <td className="py-1.5 pr-3">{l.productName ?? '—'}</td>
                    <td className="py-1.5 pr-3 text-right tabular-nums">
                      {l.buyQty !== undefined && l.buyUnit
                        ? quantityText(l.buyQty, l.buyUnit)
                        : '—'}
                    </td>
                    <td className="py-1.5 pr-3 text-right tabular-nums">
                      {l.unitPrice !== undefined ? money(l.unitPrice) : '—'}
                    </td>
                    <td className="py-1.5 text-right tabular-nums">
                      {l.unpriced ? (
                        <span className="text-clay-700" data-testid="unpriced">
                          Not priced: {l.unpriced}
                        </span>
                      ) : (
                        money(l.amount ?? 0)
                      )}
                    </td>
                  </tr>
                ))}
              </tbody>
            ))}
            <tfoot className="text-ash-900">
              <tr>
                <th scope="row" colSpan={5} className="pt-3 pr-3 text-right font-semibold">
                  Subtotal
                </th>
                <td className="pt-3 text-right tabular-nums">{money(priced.subtotal)}</td>
              </tr>
              <tr>
                <th scope="row" colSpan={5} className="pr-3 text-right font-semibold">
                  Waste allowance {priced.wastePct}%
                </th>
                <td className="text-right tabular-nums">{money(priced.waste)}</td>
              </tr>
              <tr className="text-base">
                <th scope="row" colSpan={5} className="pr-3 text-right font-bold">
                  Total
                </th>
                <td className="text-right font-bold tabular-nums" data-testid="materials-total">
                  {money(priced.total)}
                </td>
              </tr>
            </tfoot>
          </table>
          {priced.unpricedCount ? (
            <p className="mt-2 text-sm text-clay-700">
              {priced.unpricedCount} line{priced.unpricedCount === 1 ? '' : 's'} not priced and not
              in the total: choose the product in the design or add it to the catalogue.
            </p>
          ) : null}
        </div>
      ) : null}

      <div className="flex flex-wrap gap-2">
        <a
          className={buttonClasses('secondary', 'sm')}
          href={materialsUrl(designId, { wastePct: lastGoodWaste, format: 'csv' })}
          download
        >
          Download CSV
        </a>
        <a className={buttonClasses('secondary', 'sm')} href={planUrl(designId, 'a4')} download>
          Framing plan PDF (A4)
        </a>
        <a className={buttonClasses('secondary', 'sm')} href={planUrl(designId, 'a3')} download>
          Framing plan PDF (A3)
        </a>
      </div>
      {livePricing.live ? (
        <p className="text-xs text-ash-600">
          The downloads are made from the last saved version of this design.
        </p>
      ) : null}
      <SafetyNotice variant="compact" />
    </section>
  );
}
