import { createContext, useCallback, useContext, useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import { cn } from '@/lib/cn';
import { AlertIcon, CheckIcon, CloseIcon } from './icons';

export type ToastTone = 'success' | 'error' | 'info';

export interface ToastInput {
  title: string;
  description?: string;
  tone?: ToastTone;
}

interface ToastItem extends Required<Pick<ToastInput, 'title' | 'tone'>> {
  id: number;
  description?: string;
}

interface ToastApi {
  show: (toast: ToastInput) => void;
}

const ToastContext = createContext<ToastApi | null>(null);

const DISMISS_AFTER_MS = 6000;

/** Short confirmations that do not block work; they sit above the phone's bottom bar. */
export function ToastProvider({ children }: { children: ReactNode }) {
  const [toasts, setToasts] = useState<ToastItem[]>([]);
  const nextId = useRef(1);

  const dismiss = useCallback((id: number) => setToasts((items) => items.filter((t) => t.id !== id)), []);

  const show = useCallback((toast: ToastInput) => {
    const id = nextId.current++;
    setToasts((items) => [...items.slice(-2), { id, title: toast.title, description: toast.description, tone: toast.tone ?? 'success' }]);
  }, []);

  const api = useMemo(() => ({ show }), [show]);

  return (
    <ToastContext value={api}>
      {children}
      <div
        aria-live="polite"
        role="status"
        className="pointer-events-none fixed inset-x-3 bottom-24 z-[60] flex flex-col gap-2 md:inset-x-auto md:right-6 md:bottom-6 md:w-96"
      >
        {toasts.map((toast) => (
          <ToastCard key={toast.id} toast={toast} onDismiss={dismiss} />
        ))}
      </div>
    </ToastContext>
  );
}

function ToastCard({ toast, onDismiss }: { toast: ToastItem; onDismiss: (id: number) => void }) {
  useEffect(() => {
    const timer = window.setTimeout(() => onDismiss(toast.id), DISMISS_AFTER_MS);
    return () => window.clearTimeout(timer);
  }, [toast.id, onDismiss]);

  return (
    <div
      className={cn(
        'pointer-events-auto flex items-start gap-3 rounded-[var(--radius-control)] border-l-4 bg-ink-950 px-4 py-3 text-white shadow-xl',
        toast.tone === 'error' ? 'border-danger-100' : 'border-copper-400',
      )}
    >
      {toast.tone === 'error' ? <AlertIcon className="mt-0.5 shrink-0 text-danger-100" /> : <CheckIcon className="mt-0.5 shrink-0 text-copper-300" />}
      <div className="flex flex-1 flex-col">
        <p className="font-semibold">{toast.title}</p>
        {toast.description ? <p className="text-sm text-ink-200">{toast.description}</p> : null}
      </div>
      <button
        type="button"
        onClick={() => onDismiss(toast.id)}
        aria-label="Dismiss"
        className="on-dark -my-1 -mr-2 flex size-11 shrink-0 items-center justify-center rounded-[var(--radius-control)] hover:bg-ink-800"
      >
        <CloseIcon className="size-5" />
      </button>
    </div>
  );
}

export function useToast(): ToastApi {
  const api = useContext(ToastContext);
  if (!api) throw new Error('useToast needs a ToastProvider above it');
  return api;
}
