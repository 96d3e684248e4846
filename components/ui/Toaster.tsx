'use client';
// Short-lived confirmations ("Status changed") in a polite live region; errors stay inline instead.
import {
  createContext,
  useCallback,
  useContext,
  useMemo,
  useRef,
  useState,
  type ReactNode,
} from 'react';

type Toast = { id: number; message: string; tone: 'success' | 'info' };
type ToastApi = { toast: (message: string, tone?: Toast['tone']) => void };

const ToastContext = createContext<ToastApi>({ toast: () => {} });

/** Shows a toast from anywhere under <ToastProvider>. */
export function useToast(): ToastApi {
  return useContext(ToastContext);
}

export function ToastProvider({ children }: { children: ReactNode }) {
  const [toasts, setToasts] = useState<Toast[]>([]);
  const next = useRef(1);

  const dismiss = useCallback((id: number) => {
    setToasts((list) => list.filter((t) => t.id !== id));
  }, []);

  const toast = useCallback(
    (message: string, tone: Toast['tone'] = 'success') => {
      const id = next.current++;
      setToasts((list) => [...list.slice(-2), { id, message, tone }]);
      window.setTimeout(() => dismiss(id), 4000);
    },
    [dismiss],
  );

  const api = useMemo(() => ({ toast }), [toast]);

  return (
    <ToastContext.Provider value={api}>
      {children}
      <div
        role="status"
        aria-live="polite"
        data-testid="toasts"
        className="pointer-events-none fixed inset-x-0 bottom-4 z-50 flex flex-col items-center gap-2 px-4 sm:bottom-6"
      >
        {toasts.map((t) => (
          <div
            key={t.id}
            className="pointer-events-auto flex min-h-11 items-center gap-3 rounded-lg bg-spruce-900 py-2 pl-4 pr-2 text-sm text-white shadow-lift"
          >
            <span
              className={`size-2 rounded-full ${t.tone === 'success' ? 'bg-larch-300' : 'bg-spruce-200'}`}
              aria-hidden="true"
            />
            <span>{t.message}</span>
            <button
              type="button"
              onClick={() => dismiss(t.id)}
              className="grid min-h-11 min-w-11 place-items-center rounded-md text-spruce-200 hover:bg-white/10 hover:text-white"
              aria-label="Dismiss"
            >
              <svg viewBox="0 0 20 20" className="size-4" aria-hidden="true">
                <path
                  d="M5 5l10 10M15 5 5 15"
                  stroke="currentColor"
                  strokeWidth="2"
                  strokeLinecap="round"
                />
              </svg>
            </button>
          </div>
        ))}
      </div>
    </ToastContext.Provider>
  );
}
