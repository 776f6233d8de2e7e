import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { paths } from '@/config/paths';
import { Button, ButtonLink } from '@/components/ui/button';
import { NotFoundPage } from './not-found';

/** Shown when a page fails as a whole; a panel's failure stays inside its own boundary. */
export function RouteError() {
  const error = useRouteError();
  if (isRouteErrorResponse(error) && error.status === 404) return <NotFoundPage />;
  return (
    <main className="mx-auto flex min-h-dvh max-w-xl flex-col justify-center gap-4 p-6">
      <title>Something went wrong · Ferrule</title>
      <h1 className="text-2xl font-bold text-ink-950">This page could not be shown</h1>
      <p className="text-ink-700">Something went wrong while showing this page. Try again; if it keeps happening, tell your administrator what you were doing.</p>
      <div className="flex flex-wrap gap-3">
        <Button onClick={() => window.location.reload()}>Try again</Button>
        <ButtonLink to={paths.home.getHref()} reloadDocument>
          Go to your home page
        </ButtonLink>
      </div>
    </main>
  );
}
