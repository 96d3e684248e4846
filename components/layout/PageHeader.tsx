// A page's title row: heading, optional line below it, actions on the right (below on a phone).
import type { ReactNode } from 'react';

export function PageHeader({
  title,
  description,
  actions,
  eyebrow,
}: {
  title: ReactNode;
  description?: ReactNode;
  actions?: ReactNode;
  eyebrow?: ReactNode;
}) {
  return (
    <div className="mb-5 flex flex-col gap-3 sm:mb-6 sm:flex-row sm:items-end sm:justify-between">
      <div className="min-w-0">
        {eyebrow ? <div className="mb-1 text-sm">{eyebrow}</div> : null}
        <h1 className="text-2xl font-bold tracking-tight text-ash-950 sm:text-[1.75rem]">
          {title}
        </h1>
        {description ? <div className="mt-1 text-ash-600">{description}</div> : null}
      </div>
      {actions ? <div className="flex shrink-0 flex-wrap gap-2">{actions}</div> : null}
    </div>
  );
}
