import { paths } from '@/config/paths';
import { ButtonLink } from '@/components/ui/button';
import { Brand } from '@/components/layouts/brand';

export function NotFoundPage() {
  return (
    <div className="flex min-h-dvh flex-col bg-ink-50">
      <header className="on-dark bg-ink-950 px-4 py-3 sm:px-8">
        <Brand />
      </header>
      <main id="main" className="mx-auto flex w-full max-w-xl flex-1 flex-col justify-center gap-4 px-4 py-10">
        <title>Page not found · Ferrule</title>
        <p className="font-mono text-sm font-semibold text-copper-700">404</p>
        <h1 className="text-3xl font-bold text-ink-950">Page not found</h1>
        <p className="text-ink-700">There is no page at this address. It may have been mistyped, or the link that brought you here is out of date.</p>
        <ButtonLink to={paths.home.getHref()} variant="primary" className="self-start">
          Go to your home page
        </ButtonLink>
      </main>
    </div>
  );
}
