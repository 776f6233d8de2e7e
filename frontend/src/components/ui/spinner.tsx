import { cn } from '@/lib/cn';

export function Spinner({ className, label }: { className?: string; label?: string }) {
  return (
    <span className={cn('inline-flex items-center gap-2', className)}>
      <svg viewBox="0 0 24 24" className="size-5 animate-spin" aria-hidden="true" focusable="false">
        <circle cx="12" cy="12" r="9" fill="none" stroke="currentColor" strokeOpacity="0.25" strokeWidth="3" />
        <path d="M21 12a9 9 0 0 0-9-9" fill="none" stroke="currentColor" strokeWidth="3" strokeLinecap="round" />
      </svg>
      {label ? <span>{label}</span> : null}
    </span>
  );
}

/** Fills the screen while the app finds out who is signed in. */
export function FullPageSpinner({ label }: { label: string }) {
  return (
    <div role="status" className="flex min-h-dvh items-center justify-center p-6 text-ink-700">
      <Spinner label={label} className="text-lg" />
    </div>
  );
}
