'use client';
// The owner's product form: add or change a product, checked with the same schema as the API; remove with confirmation.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useMemo, useState, type FormEvent } from 'react';
import { Alert } from '@/components/ui/Alert';
import { Button } from '@/components/ui/Button';
import { ConfirmDialog } from '@/components/ui/ConfirmDialog';
import { Field } from '@/components/ui/Field';
import { Input } from '@/components/ui/Input';
import { Select } from '@/components/ui/Select';
import { useToast } from '@/components/ui/Toaster';
import { ApiError, errorMessage, fetchJson } from '@/components/ui/fetchJson';
import { apiFieldsToFieldErrors, type FieldErrors } from '@/components/ui/fieldErrors';
import type { UnitSystem } from '@/lib/units';
import {
  PRODUCT_KINDS,
  PRODUCT_UNITS,
  type ProductDto,
  type ProductInput,
  type ProductKind,
} from '@/lib/validation/product';
import { SpanPreview } from './SpanPreview';
import { SpanRowsEditor } from './SpanRowsEditor';
import {
  defaultUnitFor,
  fromFormState,
  showsBoard,
  showsSpan,
  toFormState,
  type ProductFormState,
} from './productForm';
import { kindLabels, unitLabels } from './productFormat';

export function ProductEditor({
  product,
  units,
  onDone,
}: {
  product: ProductDto | null;
  units: UnitSystem;
  onDone: () => void;
}) {
  const queryClient = useQueryClient();
  const { toast } = useToast();
  const [s, setS] = useState<ProductFormState>(() => toFormState(product, units));
  const [errors, setErrors] = useState<FieldErrors>({});
  const [confirmDelete, setConfirmDelete] = useState(false);
  const set = <K extends keyof ProductFormState>(key: K, value: ProductFormState[K]) =>
    setS((prev) => ({ ...prev, [key]: value }));
  const lengthHint = units === 'metric' ? 'mm, or e.g. 3.6 m' : "e.g. 12' or 9' 10\"";

  const save = useMutation({
    mutationFn: (body: ProductInput) =>
      product
        ? fetchJson<ProductDto>(`/api/products/${product.id}`, { method: 'PATCH', json: body })
        : fetchJson<ProductDto>('/api/products', { method: 'POST', json: body }),
    onSuccess: async (saved) => {
      await queryClient.invalidateQueries({ queryKey: ['products'] });
      toast(product ? `Saved ${saved.name}` : `Added ${saved.name}`);
      onDone();
    },
    onError: (err) => {
      if (err instanceof ApiError && Object.keys(err.fields).length) {
        setErrors(apiFieldsToFieldErrors(err.fields));
      }
    },
  });

  const remove = useMutation({
    mutationFn: () => fetchJson<void>(`/api/products/${product!.id}`, { method: 'DELETE' }),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: ['products'] });
      toast(`Removed ${product!.name}`);
      onDone();
    },
  });

  // The preview follows the form as typed, valid or not.
  const previewInput = useMemo(() => fromFormState(s, units).input, [s, units]);

  function onSubmit(e: FormEvent) {
    e.preventDefault();
    const r = fromFormState(s, units);
    if (r.errors) {
      setErrors(r.errors);
      return;
    }
    setErrors({});
    save.mutate(r.input);
  }

  const title = product ? `Change ${product.name}` : 'New product';
  return (
    <form
      noValidate
      onSubmit={onSubmit}
      aria-label={title}
      className="flex flex-col gap-5 rounded-xl border border-ash-200 bg-white p-4 shadow-card sm:p-6"
    >
      <div className="flex items-center justify-between gap-3">
        <h2 className="text-lg font-semibold text-ash-900">{title}</h2>
        <Button variant="ghost" onClick={onDone}>
          Close
        </Button>
      </div>

      {save.isError ? (
        <Alert tone="error" title="The product was not saved">
          {errorMessage(save.error)}
        </Alert>
      ) : null}
      {remove.isError ? (
        <Alert tone="error" title="The product was not removed">
          {errorMessage(remove.error)}
        </Alert>
      ) : null}

      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        <Field label="Kind" error={errors.kind}>
          {(a11y) => (
            <Select
              {...a11y}
              name="kind"
              value={s.kind}
              onChange={(e) => {
                const kind = e.target.value as ProductKind;
                setS((prev) => ({
                  ...prev,
                  kind,
                  unit: product ? prev.unit : defaultUnitFor(kind),
                }));
              }}
            >
              {PRODUCT_KINDS.map((k) => (
                <option key={k} value={k}>
                  {kindLabels[k]}
                </option>
              ))}
            </Select>
          )}
        </Field>
        <Field label="Name" error={errors.name} className="lg:col-span-2">
          {(a11y) => (
            <Input
              {...a11y}
              name="name"
              value={s.name}
              onChange={(e) => set('name', e.target.value)}
            />
          )}
        </Field>
        <Field label="SKU" error={errors.sku} hint="Your own code; unique in your catalogue.">
          {(a11y) => (
            <Input
              {...a11y}
              name="sku"
              value={s.sku}
              onChange={(e) => set('sku', e.target.value)}
            />
          )}
        </Field>
        <Field label="Price" error={errors.unitPrice}>
          {(a11y) => (
            <Input
              {...a11y}
              name="unitPrice"
              inputMode="decimal"
              value={s.unitPrice}
              onChange={(e) => set('unitPrice', e.target.value)}
            />
          )}
        </Field>
        <Field label="Priced" error={errors.unit}>
          {(a11y) => (
            <Select
              {...a11y}
              name="unit"
              value={s.unit}
              onChange={(e) => set('unit', e.target.value)}
            >
              {PRODUCT_UNITS.map((u) => (
                <option key={u} value={u}>
                  {unitLabels[u]}
                </option>
              ))}
            </Select>
          )}
        </Field>
      </div>

      <fieldset className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
        <legend className="mb-2 text-base font-semibold text-ash-900">Sizes</legend>
        <Field label="Width" optional error={errors['dimensions.widthMm']}>
          {(a11y) => (
            <Input
              {...a11y}
              name="width"
              placeholder={lengthHint}
              value={s.width}
              onChange={(e) => set('width', e.target.value)}
            />
          )}
        </Field>
        <Field label="Depth" optional error={errors['dimensions.depthMm']}>
          {(a11y) => (
            <Input
              {...a11y}
              name="depth"
              placeholder={lengthHint}
              value={s.depth}
              onChange={(e) => set('depth', e.target.value)}
            />
          )}
        </Field>
        <Field label="Length" optional error={errors['dimensions.lengthMm']}>
          {(a11y) => (
            <Input
              {...a11y}
              name="length"
              placeholder={lengthHint}
              value={s.length}
              onChange={(e) => set('length', e.target.value)}
            />
          )}
        </Field>
        <Field
          label="Stock lengths"
          optional
          error={errors.stockLengthsMm}
          hint="Separate several with commas."
        >
          {(a11y) => (
            <Input
              {...a11y}
              name="stockLengths"
              placeholder={units === 'metric' ? '3000, 4800' : "10', 16'"}
              value={s.stockLengths}
              onChange={(e) => set('stockLengths', e.target.value)}
            />
          )}
        </Field>
      </fieldset>

      {showsSpan(s.kind) ? (
        <fieldset className="flex flex-col gap-4">
          <legend className="mb-1 text-base font-semibold text-ash-900">Span</legend>
          <p className="text-sm text-ash-600">
            Enter the maker’s span table as they publish it, or the material properties for an
            engineered span, or both. Between rows the checks use the row for the next wider
            centres.
          </p>
          <div>
            <h3 className="mb-2 text-sm font-semibold text-ash-800">Maker’s span table</h3>
            <SpanRowsEditor
              rows={s.spanRows}
              onChange={(rows) => set('spanRows', rows)}
              errors={errors}
              unitHint={units === 'metric' ? 'mm' : 'ft/in'}
            />
            {errors.spanTable ? (
              <p className="mt-1 text-sm font-medium text-clay-700" role="status">
                {errors.spanTable}
              </p>
            ) : null}
          </div>
          <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
            <Field
              label="E (MPa)"
              optional
              error={errors['material.EMPa']}
              hint="Modulus of elasticity."
            >
              {(a11y) => (
                <Input
                  {...a11y}
                  name="EMPa"
                  inputMode="decimal"
                  value={s.EMPa}
                  onChange={(e) => set('EMPa', e.target.value)}
                />
              )}
            </Field>
            <Field
              label="Allowable bending stress (MPa)"
              optional
              error={errors['material.fbMPa']}
              hint="A working stress, already reduced for wet use — not a characteristic strength."
            >
              {(a11y) => (
                <Input
                  {...a11y}
                  name="fbMPa"
                  inputMode="decimal"
                  value={s.fbMPa}
                  onChange={(e) => set('fbMPa', e.target.value)}
                />
              )}
            </Field>
            <Field label="Allowable shear stress (MPa)" optional error={errors['material.fvMPa']}>
              {(a11y) => (
                <Input
                  {...a11y}
                  name="fvMPa"
                  inputMode="decimal"
                  value={s.fvMPa}
                  onChange={(e) => set('fvMPa', e.target.value)}
                />
              )}
            </Field>
            <Field
              label="Density (kg/m³)"
              optional
              error={errors['material.densityKgM3']}
              hint="Adds the member’s own weight."
            >
              {(a11y) => (
                <Input
                  {...a11y}
                  name="densityKgM3"
                  inputMode="decimal"
                  value={s.densityKgM3}
                  onChange={(e) => set('densityKgM3', e.target.value)}
                />
              )}
            </Field>
          </div>
          <div>
            <h3 className="mb-2 text-sm font-semibold text-ash-800">Spans the checks will use</h3>
            <SpanPreview input={previewInput} units={units} />
          </div>
        </fieldset>
      ) : null}

      {showsBoard(s.kind) ? (
        <fieldset className="grid gap-4 sm:grid-cols-2">
          <legend className="mb-2 text-base font-semibold text-ash-900">
            Joist centres under this board
          </legend>
          <Field
            label="Maximum centres, laid square"
            error={errors['boardMaxCentres.straightMm'] ?? errors.boardMaxCentres}
          >
            {(a11y) => (
              <Input
                {...a11y}
                name="straightCentres"
                placeholder={lengthHint}
                value={s.straightCentres}
                onChange={(e) => set('straightCentres', e.target.value)}
              />
            )}
          </Field>
          <Field
            label="Maximum centres, laid at an angle"
            error={errors['boardMaxCentres.angledMm']}
            hint="The maker’s figure for boards not square to the joists."
          >
            {(a11y) => (
              <Input
                {...a11y}
                name="angledCentres"
                placeholder={lengthHint}
                value={s.angledCentres}
                onChange={(e) => set('angledCentres', e.target.value)}
              />
            )}
          </Field>
        </fieldset>
      ) : null}

      <label className="flex min-h-11 items-center gap-3 text-sm font-semibold text-ash-800">
        <input
          type="checkbox"
          className="size-5 accent-spruce-700"
          checked={s.active}
          onChange={(e) => set('active', e.target.checked)}
        />
        In use (designers can choose it)
      </label>

      <div className="flex flex-col-reverse gap-3 sm:flex-row sm:justify-between">
        {product ? (
          <Button variant="danger" onClick={() => setConfirmDelete(true)}>
            Remove product
          </Button>
        ) : (
          <span />
        )}
        <div className="flex flex-col-reverse gap-3 sm:flex-row">
          <Button variant="secondary" onClick={onDone}>
            Cancel
          </Button>
          <Button type="submit" busy={save.isPending}>
            {product ? 'Save product' : 'Add product'}
          </Button>
        </div>
      </div>

      <ConfirmDialog
        open={confirmDelete}
        title={`Remove ${product?.name ?? 'this product'}?`}
        confirmLabel="Remove"
        busy={remove.isPending}
        onConfirm={() => {
          setConfirmDelete(false);
          remove.mutate();
        }}
        onCancel={() => setConfirmDelete(false)}
      >
        Designs that chose it will show its lines as unpriced. To keep it for old designs, untick
        “In use” instead.
      </ConfirmDialog>
    </form>
  );
}
