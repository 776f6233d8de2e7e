import type { ReactNode } from 'react';

/** The heading of a signed-in page, with its main actions beside it. */
export function PageHeader({ title, description, actions, before }: { title: string; description?: ReactNode; actions?: ReactNode; before?: ReactNode }) {
  return (
    <div className="mb-6 flex flex-col gap-2">
      <title>{`${title} · Ferrule`}</title>
      {before}
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div className="flex flex-col gap-1">
          <h1 className="text-2xl font-bold text-ink-950 md:text-3xl">{title}</h1>
          {description ? <div className="text-ink-700">{description}</div> : null}
        </div>
        {actions ? <div className="flex flex-wrap gap-3">{actions}</div> : null}
      </div>
    </div>
  );
}
