'use client';
// Settings: the firm and its team (from GET /api/firm) beside the signed-in person's own choices.
import { useQuery } from '@tanstack/react-query';
import { LoadError } from '@/components/ui/LoadError';
import { Card } from '@/components/ui/Card';
import { Spinner } from '@/components/ui/Spinner';
import { fetchJson } from '@/components/ui/fetchJson';
import { roleLabels, type ShellUser } from '@/components/layout/roles';
import type { FirmDto } from '@/lib/validation/firm';
import { FirmCard } from './FirmCard';
import { TeamTable } from './TeamTable';
import { UnitsPreference } from './UnitsPreference';

const roleAbilities = {
  owner: 'You can manage the team, the catalogue and prices, and every job.',
  designer: 'You can create and change jobs, designs and quotes.',
  crew: 'You can read jobs and plans, and download plans and cut lists.',
} as const;

export function SettingsView({ user }: { user: ShellUser }) {
  const firm = useQuery({
    queryKey: ['firm'],
    queryFn: ({ signal }) => fetchJson<FirmDto>('/api/firm', { signal }),
  });

  return (
    <div className="grid items-start gap-4 lg:grid-cols-[minmax(0,6fr)_minmax(0,5fr)] lg:gap-6">
      <div className="flex flex-col gap-4">
        {firm.isLoading ? (
          <div className="flex min-h-40 items-center justify-center gap-3 rounded-xl border border-ash-200 bg-white text-ash-600">
            <Spinner /> Loading the firm…
          </div>
        ) : firm.isError || !firm.data ? (
          <LoadError
            title="The firm could not be loaded"
            error={firm.error}
            onRetry={() => void firm.refetch()}
          />
        ) : (
          <>
            <FirmCard firm={firm.data.firm} />
            <TeamTable users={firm.data.users} meId={user.id} />
          </>
        )}
      </div>
      <div className="flex flex-col gap-4">
        <Card title="You">
          <p className="font-semibold text-ash-950">{user.name}</p>
          <p className="text-ash-700">{user.email}</p>
          <p className="mt-3 text-sm text-ash-700">
            <span className="font-semibold text-ash-900">{roleLabels[user.role]}.</span>{' '}
            {roleAbilities[user.role]}
          </p>
        </Card>
        <UnitsPreference initial={user.units} />
      </div>
    </div>
  );
}
