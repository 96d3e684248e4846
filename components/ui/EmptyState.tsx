// A friendly placeholder for a list with nothing in it yet, with an optional next step.
import type { ReactNode } from 'react';

export function EmptyState({
  title,
  children,
  action,
  icon,
}: {
  title: ReactNode;
  children?: ReactNode;
  action?: ReactNode;
  icon?: ReactNode;
}) {
  return (
    <div className="flex flex-col items-center gap-3 rounded-xl border border-dashed border-ash-300 bg-white/60 px-6 py-10 text-center">
      <div className="text-larch-500" aria-hidden="true">
        {icon ?? (
          <svg viewBox="0 0 48 48" className="size-12">
            <rect x="6" y="12" width="36" height="6" rx="1.5" fill="currentColor" opacity="0.35" />
            <rect x="6" y="21" width="36" height="6" rx="1.5" fill="currentColor" opacity="0.6" />
            <rect x="6" y="30" width="36" height="6" rx="1.5" fill="currentColor" />
          </svg>
        )}
      </div>
      <h3 className="text-lg font-semibold text-ash-900">{title}</h3>
      {children ? <div className="max-w-md text-ash-600">{children}</div> : null}
      {action ? <div className="mt-2">{action}</div> : null}
    </div>
  );
}
