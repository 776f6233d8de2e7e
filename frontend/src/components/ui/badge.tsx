import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';

export type BadgeTone = 'neutral' | 'accent' | 'success' | 'muted' | 'danger' | 'inverse';

const tones: Record<BadgeTone, string> = {
  neutral: 'bg-ink-100 text-ink-900 border-ink-300',
  accent: 'bg-copper-100 text-copper-800 border-copper-300',
  success: 'bg-success-100 text-success-700 border-success-700/40',
  muted: 'bg-white text-ink-600 border-ink-400 border-dashed',
  danger: 'bg-danger-100 text-danger-800 border-danger-700/40',
  inverse: 'bg-copper-400 text-ink-950 border-copper-400',
};

/** A short status word. The word carries the meaning; the tint only helps scanning. */
export function Badge({ tone = 'neutral', children, className }: { tone?: BadgeTone; children: ReactNode; className?: string }) {
  return (
    <span className={cn('inline-flex items-center rounded-full border px-2.5 py-0.5 text-sm font-semibold whitespace-nowrap', tones[tone], className)}>
      {children}
    </span>
  );
}
