// The firm as the team sees it: name, address and contact details.
import { Card } from '@/components/ui/Card';
import type { FirmDto } from '@/lib/validation/firm';

export function FirmCard({ firm }: { firm: FirmDto['firm'] }) {
  const addressLines = [firm.address, firm.town, firm.postcode].filter((l) => l && l.trim());
  return (
    <Card title="Your firm">
      <div className="flex items-start gap-4">
        <span
          className="grid size-12 shrink-0 place-items-center rounded-xl bg-larch-100 text-lg font-bold text-larch-800"
          aria-hidden="true"
        >
          {firm.name
            .split(/\s+/)
            .slice(0, 2)
            .map((w) => w[0])
            .join('')}
        </span>
        <div className="min-w-0">
          <p className="text-lg font-semibold text-ash-950" data-testid="firm-name">
            {firm.name}
          </p>
          {addressLines.length ? (
            <address className="mt-1 not-italic text-ash-700">
              {addressLines.map((line) => (
                <span key={line} className="block">
                  {line}
                </span>
              ))}
            </address>
          ) : null}
          {firm.phone || firm.email ? (
            <p className="mt-2 flex flex-wrap gap-x-4 text-sm">
              {firm.phone ? (
                <a
                  className="text-spruce-700 hover:underline"
                  href={`tel:${firm.phone.replace(/\s+/g, '')}`}
                >
                  {firm.phone}
                </a>
              ) : null}
              {firm.email ? (
                <a className="text-spruce-700 hover:underline" href={`mailto:${firm.email}`}>
                  {firm.email}
                </a>
              ) : null}
            </p>
          ) : null}
        </div>
      </div>
    </Card>
  );
}
