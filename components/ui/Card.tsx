// A titled panel on the page.
import { useId, type ReactNode } from 'react';

export function Card({
  title,
  actions,
  children,
  className = '',
  bodyClassName = 'p-4 sm:p-5',
  id,
}: {
  title?: ReactNode;
  actions?: ReactNode;
  children: ReactNode;
  className?: string;
  bodyClassName?: string;
  id?: string;
}) {
  const autoId = useId();
  const headingId = `${id ?? autoId}-title`;
  return (
    <section
      id={id}
      aria-labelledby={title ? headingId : undefined}
      className={`rounded-xl border border-ash-200 bg-white shadow-card ${className}`}
    >
      {title ? (
        <div className="flex min-h-14 items-center justify-between gap-3 border-b border-ash-100 px-4 py-2 sm:px-5">
          <h2 id={headingId} className="text-base font-semibold text-ash-900">
            {title}
          </h2>
          {actions ? <div className="flex shrink-0 items-center gap-2">{actions}</div> : null}
        </div>
      ) : null}
      <div className={bodyClassName}>{children}</div>
    </section>
  );
}
