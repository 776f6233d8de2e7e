import type { ReactNode } from 'react';
import type { AppMetaDto } from '@shared/schemas/auth.schema';
import { Badge } from '@/components/ui/badge';
import { Brand } from './brand';
import { DemoBanner } from './demo-banner';

/** The frame of the pages before signing in: the brand, a demo marker, and one card. */
export function AuthLayout({ meta, children }: { meta: AppMetaDto; children: ReactNode }) {
  const demo = meta.mode === 'demo';
  return (
    <div className="flex min-h-dvh flex-col bg-ink-50">
      <header className="on-dark flex items-center justify-between gap-3 bg-ink-950 px-4 py-3 sm:px-8">
        <Brand companyName={meta.companyName} />
        {demo ? <Badge tone="inverse">Demo</Badge> : null}
      </header>
      {demo ? <DemoBanner /> : null}
      <main id="main" className="flex flex-1 justify-center px-4 py-8 sm:py-14">
        <div className="w-full max-w-md">{children}</div>
      </main>
    </div>
  );
}

/** One task before signing in: a heading, a sentence, then the form. */
export function AuthCard({ title, description, children }: { title: string; description?: ReactNode; children: ReactNode }) {
  return (
    <section aria-labelledby="auth-card-title" className="rounded-[var(--radius-card)] border border-ink-200 bg-white px-5 py-6 shadow-sm sm:px-8 sm:py-8">
      <title>{`${title} · Ferrule`}</title>
      <h1 id="auth-card-title" className="text-2xl font-bold text-ink-950">
        {title}
      </h1>
      {description ? <div className="mt-2 text-ink-700">{description}</div> : null}
      <div className="mt-6">{children}</div>
    </section>
  );
}
