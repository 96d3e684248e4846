// An inline message box. Errors are announced (role="alert"); other tones are polite status messages.
import type { ReactNode } from 'react';

export type AlertTone = 'error' | 'warning' | 'success' | 'info';

const tones: Record<AlertTone, { box: string; icon: string; path: string }> = {
  error: {
    box: 'border-clay-200 bg-clay-50 text-clay-800',
    icon: 'text-clay-600',
    path: 'M10 2a8 8 0 1 1 0 16 8 8 0 0 1 0-16Zm0 4a1 1 0 0 0-1 1v4a1 1 0 1 0 2 0V7a1 1 0 0 0-1-1Zm0 8.5a1.1 1.1 0 1 0 0-2.2 1.1 1.1 0 0 0 0 2.2Z',
  },
  warning: {
    box: 'border-larch-300 bg-larch-50 text-larch-900',
    icon: 'text-larch-600',
    path: 'M8.3 3.1a2 2 0 0 1 3.4 0l6.1 10.6A2 2 0 0 1 16.1 17H3.9a2 2 0 0 1-1.7-3.3L8.3 3.1ZM10 7a1 1 0 0 0-1 1v3a1 1 0 1 0 2 0V8a1 1 0 0 0-1-1Zm0 7.6a1.1 1.1 0 1 0 0-2.2 1.1 1.1 0 0 0 0 2.2Z',
  },
  success: {
    box: 'border-spruce-200 bg-spruce-50 text-spruce-900',
    icon: 'text-spruce-600',
    path: 'M10 2a8 8 0 1 1 0 16 8 8 0 0 1 0-16Zm3.7 5.3a1 1 0 0 0-1.4 0L9 10.6 7.7 9.3a1 1 0 1 0-1.4 1.4l2 2a1 1 0 0 0 1.4 0l4-4a1 1 0 0 0 0-1.4Z',
  },
  info: {
    box: 'border-tarn-500/30 bg-tarn-100 text-tarn-800',
    icon: 'text-tarn-500',
    path: 'M10 2a8 8 0 1 1 0 16 8 8 0 0 1 0-16Zm0 7a1 1 0 0 0-1 1v4a1 1 0 1 0 2 0v-4a1 1 0 0 0-1-1Zm0-3.5a1.1 1.1 0 1 0 0 2.2 1.1 1.1 0 0 0 0-2.2Z',
  },
};

export function Alert({
  tone = 'info',
  title,
  children,
  action,
  className = '',
}: {
  tone?: AlertTone;
  title?: ReactNode;
  children?: ReactNode;
  action?: ReactNode;
  className?: string;
}) {
  const t = tones[tone];
  return (
    <div
      role={tone === 'error' ? 'alert' : 'status'}
      className={`flex items-start gap-3 rounded-lg border px-4 py-3 text-sm ${t.box} ${className}`}
    >
      <svg viewBox="0 0 20 20" className={`mt-0.5 size-5 shrink-0 ${t.icon}`} aria-hidden="true">
        <path fill="currentColor" d={t.path} />
      </svg>
      <div className="min-w-0 flex-1">
        {title ? <p className="font-semibold">{title}</p> : null}
        {children ? <div className={title ? 'mt-0.5' : ''}>{children}</div> : null}
      </div>
      {action ? <div className="shrink-0">{action}</div> : null}
    </div>
  );
}
