import { useParams } from 'react-router-dom';
import { formatTagCode } from '@shared/tags/tag-code';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import { ButtonLink, TextLink } from '@/components/ui/button';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { ErrorState } from '@/components/ui/error-state';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useAssembly } from '@/features/assemblies/api/get-assembly';
import { ReplaceFlow } from '@/features/assemblies/components/replace/replace-flow';

/** Replacing an installed assembly, step by step, sized for a phone in a gloved hand. */
export function ReplacePage() {
  const { id = '' } = useParams();
  const query = useAssembly(id);

  if (query.isPending) {
    return (
      <>
        <title>Replace · Ferrule</title>
        <SkeletonBlock label="Loading the assembly…" lines={5} className="mx-auto max-w-2xl" />
      </>
    );
  }
  if (query.isError) {
    if (isApiError(query.error) && (query.error.status === 404 || query.error.status === 400)) {
      return (
        <div className="flex flex-col items-start gap-4">
          <title>Assembly not found · Ferrule</title>
          <h1 className="text-2xl font-bold text-ink-950">Assembly not found</h1>
          <p className="text-ink-700">There is no assembly at this address, or it is at a site you cannot see.</p>
          <ButtonLink to={paths.find.getHref()}>Find a hose</ButtonLink>
        </div>
      );
    }
    return <ErrorState headingLevel={1} title="The assembly could not be loaded" error={query.error} onRetry={() => void query.refetch()} retrying={query.isFetching} />;
  }

  const old = query.data.assembly;
  const code = formatTagCode(old.number);
  return (
    <>
      <title>{`Replace ${code} · Ferrule`}</title>
      <div className="mx-auto mb-5 flex max-w-2xl flex-col gap-1">
        <TextLink to={paths.assemblies.detail.getHref(old.id)}>← {code}</TextLink>
        <h1 className="text-2xl font-bold text-ink-950 md:text-3xl">
          Replace <span className="font-mono tracking-wider">{code}</span>
        </h1>
        {old.position ? (
          <p className="text-lg text-ink-800">
            at <span className="font-mono font-semibold">{old.position.code}</span> {old.position.name}, {old.position.equipmentName}
          </p>
        ) : null}
      </div>
      <PanelBoundary title="The replacement could not be shown">
        <ReplaceFlow old={old} cautions={query.data.cautions} />
      </PanelBoundary>
    </>
  );
}
