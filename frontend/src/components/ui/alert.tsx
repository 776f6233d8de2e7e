import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';
import { AlertIcon, CheckIcon } from './icons';

type AlertTone = 'danger' | 'success' | 'info';

const tones: Record<AlertTone, string> = {
  danger: 'border-danger-700 bg-danger-50 text-danger-800',
  success: 'border-success-700 bg-success-100 text-success-700',
  info: 'border-ink-400 bg-ink-50 text-ink-900',
};

/** A message box inside a page or form. Errors are announced as soon as they appear. */
export function Alert({ tone = 'info', title, children, className }: { tone?: AlertTone; title?: ReactNode; children?: ReactNode; className?: string }) {
  return (
    <div role={tone === 'danger' ? 'alert' : 'status'} className={cn('flex gap-3 rounded-[var(--radius-control)] border-l-4 px-4 py-3', tones[tone], className)}>
      {tone === 'success' ? <CheckIcon className="mt-0.5 shrink-0" /> : <AlertIcon className="mt-0.5 shrink-0" />}
      <div className="flex flex-col gap-1">
        {title ? <p className="font-bold">{title}</p> : null}
        {children ? <div className="text-ink-900">{children}</div> : null}
      </div>
    </div>
  );
}
