'use client';
// The catalogue page body: search, kind and in-use filters, the product table, and the owner's form.
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { LoadError } from '@/components/ui/LoadError';
import { Button } from '@/components/ui/Button';
import { EmptyState } from '@/components/ui/EmptyState';
import { SafetyNotice } from '@/components/ui/SafetyNotice';
import { SearchInput } from '@/components/ui/SearchInput';
import { Select } from '@/components/ui/Select';
import { Spinner } from '@/components/ui/Spinner';
import { fetchJson } from '@/components/ui/fetchJson';
import type { UnitSystem } from '@/lib/units';
import { PRODUCT_KINDS, type ProductDto, type ProductKind } from '@/lib/validation/product';
import { ProductEditor } from './ProductEditor';
import { ProductTable } from './ProductTable';
import { kindLabels } from './productFormat';

const SEARCH_DEBOUNCE_MS = 250;
type Status = 'all' | 'active' | 'retired';
type Editing = { product: ProductDto | null } | null;

export function CatalogueBrowser({ units, canEdit }: { units: UnitSystem; canEdit: boolean }) {
  const [text, setText] = useState('');
  const [q, setQ] = useState('');
  const [kind, setKind] = useState<ProductKind | ''>('');
  const [status, setStatus] = useState<Status>('all');
  const [editing, setEditing] = useState<Editing>(null);

  useEffect(() => {
    const timer = window.setTimeout(() => setQ(text.trim()), SEARCH_DEBOUNCE_MS);
    return () => window.clearTimeout(timer);
  }, [text]);

  const params = new URLSearchParams();
  if (q) params.set('q', q);
  if (kind) params.set('kind', kind);
  params.set('status', status);
  const products = useQuery({
    queryKey: ['products', 'list', { q, kind, status }],
    queryFn: ({ signal }) => fetchJson<ProductDto[]>(`/api/products?${params}`, { signal }),
    placeholderData: keepPreviousData,
  });

  const filtered = Boolean(q || kind || status !== 'all');

  return (
    <div className="flex flex-col gap-4">
      {canEdit && !editing ? (
        <div>
          <Button onClick={() => setEditing({ product: null })}>Add a product</Button>
        </div>
      ) : null}
      {editing ? (
        <ProductEditor
          key={editing.product?.id ?? 'new'}
          product={editing.product}
          units={units}
          onDone={() => setEditing(null)}
        />
      ) : null}

      <div className="flex flex-col gap-3 sm:flex-row sm:items-center">
        <SearchInput
          label="Search the catalogue"
          placeholder="Search by name or SKU"
          value={text}
          onValueChange={setText}
          className="sm:max-w-md sm:flex-1"
        />
        <Select
          aria-label="Kind"
          value={kind}
          onChange={(e) => setKind(e.target.value as ProductKind | '')}
          className="sm:w-44"
        >
          <option value="">All kinds</option>
          {PRODUCT_KINDS.map((k) => (
            <option key={k} value={k}>
              {kindLabels[k]}
            </option>
          ))}
        </Select>
        <Select
          aria-label="In use"
          value={status}
          onChange={(e) => setStatus(e.target.value as Status)}
          className="sm:w-44"
        >
          <option value="all">In use and not</option>
          <option value="active">In use</option>
          <option value="retired">Not in use</option>
        </Select>
      </div>

      {products.isError ? (
        <LoadError
          title="The catalogue could not be loaded"
          error={products.error}
          onRetry={() => void products.refetch()}
        />
      ) : null}

      {products.isLoading ? (
        <div className="flex min-h-40 items-center justify-center gap-3 rounded-xl border border-ash-200 bg-white text-ash-600">
          <Spinner /> Loading the catalogue…
        </div>
      ) : products.data && products.data.length === 0 ? (
        <EmptyState
          title={filtered ? 'No products match' : 'The catalogue is empty'}
          action={
            filtered ? (
              <Button
                variant="secondary"
                onClick={() => {
                  setText('');
                  setQ('');
                  setKind('');
                  setStatus('all');
                }}
              >
                Clear search and filters
              </Button>
            ) : null
          }
        >
          {filtered
            ? 'Try another name or SKU.'
            : 'Add the joists, boards and fixings you buy, with their prices and limits.'}
        </EmptyState>
      ) : products.data ? (
        <ProductTable
          products={products.data}
          units={units}
          canEdit={canEdit}
          onOpen={(p) => setEditing({ product: p })}
        />
      ) : null}

      <SafetyNotice variant="compact" />
    </div>
  );
}
