// Everyone in the firm with their role; the signed-in person is marked.
import { Card } from '@/components/ui/Card';
import { roleLabels } from '@/components/layout/roles';
import type { FirmDto } from '@/lib/validation/firm';

const roleStyles = {
  owner: 'bg-spruce-700 text-white',
  designer: 'bg-larch-100 text-larch-800',
  crew: 'bg-ash-100 text-ash-800',
} as const;

const roleOrder = { owner: 0, designer: 1, crew: 2 } as const;

export function TeamTable({ users, meId }: { users: FirmDto['users']; meId: string }) {
  const sorted = [...users].sort(
    (a, b) => roleOrder[a.role] - roleOrder[b.role] || a.name.localeCompare(b.name),
  );
  return (
    <Card title={`Team (${users.length})`} bodyClassName="">
      <table className="w-full table-fixed text-left">
        <caption className="sr-only">People in the firm and their roles</caption>
        <thead className="border-b border-ash-100 bg-ash-50 text-xs font-semibold uppercase tracking-wide text-ash-600">
          <tr>
            <th scope="col" className="px-4 py-2.5 sm:px-5">
              Name
            </th>
            <th scope="col" className="hidden px-3 py-2.5 sm:table-cell">
              Email
            </th>
            <th scope="col" className="w-28 px-4 py-2.5 sm:px-5">
              Role
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-ash-100">
          {sorted.map((u) => (
            <tr key={u.id}>
              <td className="px-4 py-3 sm:px-5">
                <span className="font-semibold text-ash-900">{u.name}</span>
                {u.id === meId ? (
                  <span className="ml-2 rounded bg-spruce-50 px-1.5 py-0.5 text-xs font-semibold text-spruce-700">
                    you
                  </span>
                ) : null}
                <span className="block truncate text-sm text-ash-600 sm:hidden">{u.email}</span>
              </td>
              <td className="hidden truncate px-3 py-3 text-ash-700 sm:table-cell">
                <a href={`mailto:${u.email}`} className="hover:underline">
                  {u.email}
                </a>
              </td>
              <td className="px-4 py-3 sm:px-5">
                <span
                  className={`inline-block rounded-full px-2.5 py-1 text-xs font-semibold ${roleStyles[u.role]}`}
                >
                  {roleLabels[u.role]}
                </span>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </Card>
  );
}
