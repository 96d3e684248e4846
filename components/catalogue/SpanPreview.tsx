'use client';
// What the checks will take from a joist or beam as entered: its span at common centres under each code basis, with the working.
import { specsFromProducts, type CatalogueProduct } from '@/engine/products';
import { formatLength, type UnitSystem } from '@/lib/units';
import type { ProductInput } from '@/lib/validation/product';
import { productInputSchema } from '@/lib/validation/product';

const CENTRES_MM = [300, 400, 600];

export function SpanPreview({ input, units }: { input: ProductInput | null; units: UnitSystem }) {
  const parsed = input ? productInputSchema.safeParse(input) : null;
  if (!parsed?.success || (parsed.data.kind !== 'joist' && parsed.data.kind !== 'beam')) {
    return (
      <p className="text-sm text-ash-600">
        Enter the size, a stock length and a span table or material to see the spans the checks will
        use.
      </p>
    );
  }
  const product: CatalogueProduct = { id: 'preview', ...parsed.data };
  const rows = CENTRES_MM.map((c) => {
    const at = (basis: 'uk' | 'us') => {
      try {
        return specsFromProducts({ joist: product }, basis, c).joist;
      } catch {
        return null;
      }
    };
    return { centres: c, uk: at('uk'), us: at('us') };
  });
  const example = rows[1].uk ?? rows[1].us;
  return (
    <div className="flex flex-col gap-2" data-testid="span-preview">
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">Allowable spans the checks will use</caption>
        <thead>
          <tr className="text-xs uppercase tracking-wide text-ash-600">
            <th scope="col" className="pb-1 pr-3 font-semibold">
              Centres
            </th>
            <th scope="col" className="pb-1 pr-3 font-semibold">
              UK basis
            </th>
            <th scope="col" className="pb-1 font-semibold">
              US basis
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-ash-100">
          {rows.map((r) => (
            <tr key={r.centres}>
              <td className="py-1.5 pr-3">{formatLength(r.centres, units)}</td>
              {[r.uk, r.us].map((s, i) => (
                <td key={i} className="py-1.5 pr-3">
                  {s ? (
                    <>
                      span {formatLength(s.maxSpanMm, units)}, cantilever{' '}
                      {formatLength(s.maxCantileverMm, units)}
                      {s.basis === 'span-table-extrapolated' ? (
                        <span className="ml-1 text-larch-800">(beyond the maker’s table)</span>
                      ) : null}
                    </>
                  ) : (
                    '—'
                  )}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      {example ? (
        <details className="rounded-lg border border-ash-200 bg-ash-50 p-3 text-sm">
          <summary className="cursor-pointer font-semibold text-ash-800">
            How the span at {formatLength(400, units)} centres is worked out
          </summary>
          <p className="mt-2 text-ash-700">{example.source}</p>
          <pre className="mt-2 whitespace-pre-wrap font-sans text-ash-800">{example.explain}</pre>
        </details>
      ) : null}
    </div>
  );
}
