import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';

export function Card({ children, className, as: Tag = 'section', labelledBy }: { children: ReactNode; className?: string; as?: 'section' | 'div' | 'article'; labelledBy?: string }) {
  return (
    <Tag aria-labelledby={labelledBy} className={cn('rounded-[var(--radius-card)] border border-ink-200 bg-white shadow-sm', className)}>
      {children}
    </Tag>
  );
}

export function CardHeader({ title, titleId, description, actions, level = 2 }: { title: ReactNode; titleId?: string; description?: ReactNode; actions?: ReactNode; level?: 2 | 3 }) {
  const Heading = level === 2 ? 'h2' : 'h3';
  return (
    <div className="flex flex-wrap items-start justify-between gap-3 border-b border-ink-100 px-5 pt-4 pb-3">
      <div className="flex flex-col gap-0.5">
        <Heading id={titleId} className="text-lg font-bold text-ink-950">
          {title}
        </Heading>
        {description ? <p className="text-sm text-ink-600">{description}</p> : null}
      </div>
      {actions ? <div className="flex flex-wrap gap-2">{actions}</div> : null}
    </div>
  );
}

export function CardBody({ children, className }: { children: ReactNode; className?: string }) {
  return <div className={cn('px-5 py-4', className)}>{children}</div>;
}
