'use client';
// The signed-in person's display units: metric or feet and inches. Lengths are stored in mm either way.
import { useMutation } from '@tanstack/react-query';
import { useSession } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Card } from '@/components/ui/Card';
import { Spinner } from '@/components/ui/Spinner';
import { errorMessage, fetchJson } from '@/components/ui/fetchJson';
import { useToast } from '@/components/ui/Toaster';
import { formatLength, type UnitSystem } from '@/lib/units';

const choices: { value: UnitSystem; label: string; example: string }[] = [
  { value: 'metric', label: 'Metric', example: 'millimetres and metres' },
  { value: 'imperial', label: 'Feet and inches', example: 'to the nearest 1/8 inch' },
];

export function UnitsPreference({ initial }: { initial: UnitSystem }) {
  const router = useRouter();
  const { update } = useSession();
  const { toast } = useToast();
  const [units, setUnits] = useState<UnitSystem>(initial);
  const save = useMutation({
    mutationFn: (next: UnitSystem) =>
      fetchJson<{ units: UnitSystem }>('/api/me', { method: 'PATCH', json: { units: next } }),
    onMutate: (next) => {
      const previous = units;
      setUnits(next);
      return { previous };
    },
    onError: (_err, _next, ctx) => {
      if (ctx) setUnits(ctx.previous);
    },
    onSuccess: async (res) => {
      // Keep the session token in step, then let server-rendered pages pick the new units up.
      await update({ units: res.units });
      router.refresh();
      toast(
        res.units === 'metric'
          ? 'Lengths now show in metric'
          : 'Lengths now show in feet and inches',
      );
    },
  });

  return (
    <Card title="Your units">
      <fieldset>
        <legend className="text-sm text-ash-700">
          How lengths show on your screens and exports. Designs keep the same millimetres whatever
          you pick.
        </legend>
        <div className="mt-3 grid gap-2 sm:grid-cols-2">
          {choices.map((c) => {
            const checked = units === c.value;
            return (
              <label
                key={c.value}
                className={`flex min-h-16 cursor-pointer items-start gap-3 rounded-lg border p-3 transition-colors ${
                  checked
                    ? 'border-spruce-600 bg-spruce-50 ring-1 ring-spruce-600'
                    : 'border-ash-300 bg-white hover:border-ash-400'
                }`}
              >
                <input
                  type="radio"
                  name="units"
                  value={c.value}
                  checked={checked}
                  disabled={save.isPending}
                  onChange={() => save.mutate(c.value)}
                  className="mt-1 size-5 accent-spruce-700"
                />
                <span className="min-w-0">
                  <span className="block font-semibold text-ash-900">{c.label}</span>
                  <span className="block text-sm text-ash-600">
                    A board: {formatLength(4800, c.value)} · {c.example}
                  </span>
                </span>
              </label>
            );
          })}
        </div>
      </fieldset>
      <div className="text-sm" aria-live="polite">
        {save.isPending ? (
          <span className="mt-3 inline-flex items-center gap-2 text-ash-600">
            <Spinner className="size-4" /> Saving…
          </span>
        ) : save.isError ? (
          <span role="alert" className="mt-3 block font-medium text-clay-700">
            Not saved: {errorMessage(save.error)}
          </span>
        ) : null}
      </div>
    </Card>
  );
}
