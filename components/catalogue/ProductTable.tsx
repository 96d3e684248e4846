'use client';
// The catalogue as a table: name and SKU, kind, size, stock, what the checks read, price; the owner opens a row to change it.
import type { UnitSystem } from '@/lib/units';
import type { ProductDto } from '@/lib/validation/product';
import { kindLabels, limitsText, priceText, sizeText, stockText } from './productFormat';

export function ProductTable({
  products,
  units,
  canEdit,
  onOpen,
}: {
  products: ProductDto[];
  units: UnitSystem;
  canEdit: boolean;
  onOpen: (p: ProductDto) => void;
}) {
  return (
    <div className="overflow-x-auto rounded-xl border border-ash-200 bg-white shadow-card">
      <table className="w-full min-w-[44rem] border-collapse text-left text-sm">
        <caption className="sr-only">Catalogue products</caption>
        <thead className="border-b border-ash-200 bg-ash-50 text-xs uppercase tracking-wide text-ash-600">
          <tr>
            <th scope="col" className="px-3 py-2.5 font-semibold">
              Product
            </th>
            <th scope="col" className="px-3 py-2.5 font-semibold">
              Kind
            </th>
            <th scope="col" className="px-3 py-2.5 font-semibold">
              Size
            </th>
            <th scope="col" className="px-3 py-2.5 font-semibold">
              Stock
            </th>
            <th scope="col" className="px-3 py-2.5 font-semibold">
              Limits
            </th>
            <th scope="col" className="px-3 py-2.5 text-right font-semibold">
              Price
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-ash-100">
          {products.map((p) => (
            <tr
              key={p.id}
              className={`align-top ${p.active ? '' : 'text-ash-500'} ${canEdit ? 'cursor-pointer hover:bg-larch-50/70' : ''}`}
              onClick={canEdit ? () => onOpen(p) : undefined}
            >
              <td className="px-3 py-2.5">
                {canEdit ? (
                  <button
                    type="button"
                    className="text-left font-semibold text-spruce-800 underline-offset-2 hover:underline"
                    onClick={(e) => {
                      e.stopPropagation();
                      onOpen(p);
                    }}
                  >
                    {p.name}
                  </button>
                ) : (
                  <span className="font-semibold text-ash-900">{p.name}</span>
                )}
                <p className="text-xs text-ash-600">
                  {p.sku}
                  {p.active ? '' : ' · not in use'}
                </p>
              </td>
              <td className="px-3 py-2.5">{kindLabels[p.kind]}</td>
              <td className="px-3 py-2.5 whitespace-nowrap">{sizeText(p, units)}</td>
              <td className="px-3 py-2.5">{stockText(p, units)}</td>
              <td className="px-3 py-2.5">{limitsText(p, units)}</td>
              <td className="px-3 py-2.5 text-right whitespace-nowrap">{priceText(p)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
