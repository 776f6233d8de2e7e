import type { ReactNode } from 'react';
import { describeError } from '@/lib/api-client';
import { cn } from '@/lib/cn';
import { Button } from './button';
import { AlertIcon } from './icons';

interface ErrorStateProps {
  title: string;
  error?: unknown;
  /** Overrides the message taken from `error`. */
  message?: ReactNode;
  onRetry?: () => void;
  retrying?: boolean;
  className?: string;
  headingLevel?: 1 | 2 | 3;
}

/** A panel that failed: what failed, the server's reason, and a way to try again. */
export function ErrorState({ title, error, message, onRetry, retrying, className, headingLevel = 3 }: ErrorStateProps) {
  const Heading = (`h${headingLevel}` as const);
  return (
    <div role="alert" className={cn('flex flex-col items-start gap-2 rounded-[var(--radius-control)] border-2 border-danger-700 bg-danger-50 px-5 py-5', className)}>
      <div className="flex items-center gap-2 text-danger-800">
        <AlertIcon className="shrink-0" />
        <Heading className="text-lg font-bold">{title}</Heading>
      </div>
      <div className="text-ink-900">{message ?? describeError(error)}</div>
      {onRetry ? (
        <Button variant="secondary" onClick={onRetry} loading={retrying} className="mt-2">
          Try again
        </Button>
      ) : null}
    </div>
  );
}
