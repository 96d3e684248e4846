'use client';
// The maker's span table inside the product form: one row per joist centres, add and remove rows.
import { Button } from '@/components/ui/Button';
import { Input } from '@/components/ui/Input';
import type { FieldErrors } from '@/components/ui/fieldErrors';
import type { SpanRowText } from './productForm';

export function SpanRowsEditor({
  rows,
  onChange,
  errors,
  unitHint,
}: {
  rows: SpanRowText[];
  onChange: (rows: SpanRowText[]) => void;
  errors: FieldErrors;
  unitHint: string;
}) {
  const set = (i: number, key: keyof SpanRowText, value: string) =>
    onChange(rows.map((r, j) => (j === i ? { ...r, [key]: value } : r)));
  return (
    <div className="flex flex-col gap-2">
      {rows.length > 0 ? (
        <table className="w-full border-collapse text-left text-sm">
          <caption className="sr-only">Maker’s span table</caption>
          <thead>
            <tr className="text-xs uppercase tracking-wide text-ash-600">
              <th scope="col" className="pb-1 pr-2 font-semibold">
                Centres
              </th>
              <th scope="col" className="pb-1 pr-2 font-semibold">
                Max span
              </th>
              <th scope="col" className="pb-1 pr-2 font-semibold">
                Max cantilever
              </th>
              <th scope="col" className="pb-1">
                <span className="sr-only">Remove</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r, i) => (
              <tr key={i} className="align-top">
                {(['centres', 'span', 'cantilever'] as const).map((key) => {
                  const errKey = `spanTable.${i}.${key === 'centres' ? 'centresMm' : key === 'span' ? 'maxSpanMm' : 'maxCantileverMm'}`;
                  const label = `${key === 'centres' ? 'Centres' : key === 'span' ? 'Maximum span' : 'Maximum cantilever'}, row ${i + 1}`;
                  return (
                    <td key={key} className="pb-2 pr-2">
                      <Input
                        aria-label={label}
                        aria-invalid={errors[errKey] ? true : undefined}
                        value={r[key]}
                        inputMode="decimal"
                        placeholder={unitHint}
                        onChange={(e) => set(i, key, e.target.value)}
                      />
                      {errors[errKey] ? (
                        <p className="mt-1 text-xs font-medium text-clay-700">{errors[errKey]}</p>
                      ) : null}
                    </td>
                  );
                })}
                <td className="pb-2">
                  <Button
                    variant="ghost"
                    size="sm"
                    aria-label={`Remove row ${i + 1}`}
                    onClick={() => onChange(rows.filter((_, j) => j !== i))}
                  >
                    Remove
                  </Button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
      <div>
        <Button
          variant="secondary"
          size="sm"
          onClick={() => onChange([...rows, { centres: '', span: '', cantilever: '' }])}
        >
          Add span table row
        </Button>
      </div>
    </div>
  );
}
