import { useId, useState } from 'react';
import { useParams, useSearchParams } from 'react-router-dom';
import { formatTagCode } from '@shared/tags/tag-code';
import { paths, safeNextPath } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import { hasAbility, useCurrentUser } from '@/lib/auth';
import { Alert } from '@/components/ui/alert';
import { Button, ButtonLink, TextLink } from '@/components/ui/button';
import { Card, CardBody, CardHeader } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { ErrorState } from '@/components/ui/error-state';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useAssembly } from '@/features/assemblies/api/get-assembly';
import { useAssemblyEvents } from '@/features/assemblies/api/get-assembly-events';
import { useSite } from '@/features/assemblies/api/get-site';
import { AssemblyActions, type AssemblyAction } from '@/features/assemblies/components/assembly-actions';
import { OutcomeBadge, StatusBadge } from '@/features/assemblies/components/assembly-badges';
import { AssemblyChecks, OverridesPanel } from '@/features/assemblies/components/assembly-checks';
import { AssemblyFacts } from '@/features/assemblies/components/assembly-facts';
import { AssemblyPlace } from '@/features/assemblies/components/assembly-place';
import { AssemblyTimeline } from '@/features/assemblies/components/assembly-timeline';
import { ProofTestSummary } from '@/features/assemblies/components/proof-test-summary';
import type { AssemblyDto } from '@shared/schemas/assemblies.schema';

const backLink = <TextLink to={paths.register.getHref()}>← Register</TextLink>;

/** The record of one assembly: what it is, where it is, its checks, overrides, proof test and history, and what may be done to it. */
export function AssemblyPage() {
  const { id = '' } = useParams();
  const query = useAssembly(id);

  if (query.isPending) {
    return (
      <>
        <title>Assembly · Ferrule</title>
        {backLink}
        <SkeletonBlock label="Loading the assembly…" lines={8} className="mt-4 max-w-3xl" />
      </>
    );
  }
  if (query.isError) {
    if (isApiError(query.error) && (query.error.status === 404 || query.error.status === 400)) {
      return (
        <div className="flex flex-col items-start gap-4">
          <title>Assembly not found · Ferrule</title>
          <h1 className="text-2xl font-bold text-ink-950">Assembly not found</h1>
          <p className="max-w-prose text-ink-700">There is no assembly at this address, or it is at a site you cannot see.</p>
          <ButtonLink to={paths.find.getHref()}>Find a hose</ButtonLink>
        </div>
      );
    }
    return (
      <>
        <title>Assembly · Ferrule</title>
        {backLink}
        <ErrorState headingLevel={1} title="This assembly could not be loaded" error={query.error} onRetry={() => void query.refetch()} retrying={query.isFetching} className="mt-4" />
      </>
    );
  }
  return <AssemblyRecord assembly={query.data.assembly} cautions={query.data.cautions} />;
}

/** Where a link carrying `next` (from a replacement that needed a new build) goes back to, with this assembly picked. */
function continueHref(next: string, assemblyId: string): string {
  const url = new URL(safeNextPath(next), 'http://ferrule.invalid');
  url.searchParams.set('new', assemblyId);
  return `${url.pathname}${url.search}`;
}

function AssemblyRecord({ assembly, cautions }: { assembly: AssemblyDto; cautions: string[] }) {
  const me = useCurrentUser();
  const units = me.preferences;
  const [searchParams] = useSearchParams();
  const justBuilt = searchParams.get('built') === '1';
  const next = searchParams.get('next');
  const [open, setOpen] = useState<AssemblyAction | null>(justBuilt && assembly.abilities.proofTest && assembly.status === 'built' ? 'proofTest' : null);
  const site = useSite(assembly.siteId);
  const ids = { place: useId(), facts: useId(), checks: useId(), proof: useId(), history: useId(), overrides: useId() };
  const code = formatTagCode(assembly.number);

  return (
    <>
      <title>{`${code} · Ferrule`}</title>
      <div className="mb-6 flex flex-col gap-3">
        {backLink}
        <div className="flex flex-col gap-2">
          <p className="text-sm font-semibold tracking-wide text-ink-600 uppercase">Assembly</p>
          <h1 className="font-mono text-3xl font-bold tracking-wider text-ink-950 md:text-4xl">{code}</h1>
          <p className="text-lg text-ink-800">
            <span className="font-mono font-semibold">{assembly.construction.code}</span> {assembly.construction.name}
          </p>
          <div className="flex flex-wrap items-center gap-2">
            <StatusBadge status={assembly.status} />
            <OutcomeBadge outcome={assembly.checkOutcome} overridden={assembly.overridden} />
            {assembly.position ? (
              <span className="text-ink-800">
                at <span className="font-mono font-semibold">{assembly.position.code}</span>, {assembly.position.equipmentName}
              </span>
            ) : null}
          </div>
        </div>
        {justBuilt ? (
          <Alert tone="success" title={`Built and tagged ${code}`}>
            {assembly.status === 'built' ? (
              <div className="flex flex-col items-start gap-2">
                <p>It goes into stock once a proof test passes. Write the tag code on the label before it leaves the bench.</p>
                {assembly.abilities.proofTest ? <Button onClick={() => setOpen('proofTest')}>Record the proof test</Button> : null}
              </div>
            ) : (
              <div className="flex flex-col items-start gap-2">
                <p>{assembly.status === 'in_stock' ? 'Proof-tested and in stock.' : 'Recorded.'}</p>
                {next && assembly.status === 'in_stock' ? (
                  <ButtonLink to={continueHref(next, assembly.id)} variant="primary" size="lg">
                    Continue the replacement with {code}
                  </ButtonLink>
                ) : null}
              </div>
            )}
          </Alert>
        ) : null}
        <PanelBoundary title="The actions could not be shown">
          <AssemblyActions assembly={assembly} cautions={cautions} open={open} onOpen={setOpen} />
        </PanelBoundary>
      </div>

      {assembly.overrides.length ? (
        <Card labelledBy={ids.overrides} className="mb-5 border-2 border-copper-700">
          <CardHeader title="Override in force" titleId={ids.overrides} description="Failed checks a competent person accepted for this assembly at this position." />
          <CardBody>
            <OverridesPanel overrides={assembly.overrides} />
          </CardBody>
        </Card>
      ) : null}

      <div className="grid grid-cols-1 items-start gap-5 lg:grid-cols-2">
        <div className="flex flex-col gap-5">
          <Card labelledBy={ids.place}>
            <CardHeader title="Where it is" titleId={ids.place} />
            <CardBody>
              <PanelBoundary title="Where it is could not be shown">
                <AssemblyPlace assembly={assembly} />
              </PanelBoundary>
            </CardBody>
          </Card>
          <Card labelledBy={ids.proof}>
            <CardHeader title="Proof test" titleId={ids.proof} description="Hydrostatic, with water or another liquid only." />
            <CardBody>
              <PanelBoundary title="The proof test could not be shown">
                {assembly.proofTest ? (
                  <ProofTestSummary test={assembly.proofTest} units={units} />
                ) : (
                  <EmptyState
                    title="No proof test recorded"
                    action={assembly.abilities.proofTest ? <Button onClick={() => setOpen('proofTest')}>Record the proof test</Button> : undefined}
                  >
                    An assembly goes into stock only after a proof test passes.
                  </EmptyState>
                )}
              </PanelBoundary>
            </CardBody>
          </Card>
        </div>
        <Card labelledBy={ids.facts}>
          <CardHeader title="What it is" titleId={ids.facts} />
          <CardBody>
            <PanelBoundary title="What it is could not be shown">
              <AssemblyFacts assembly={assembly} units={units} currency={site.data?.currency} />
            </PanelBoundary>
          </CardBody>
        </Card>
        <Card labelledBy={ids.checks} className="lg:col-span-2">
          <CardHeader title="Selection checks" titleId={ids.checks} description="This assembly against its position’s design conditions." />
          <CardBody>
            <PanelBoundary title="The selection checks could not be shown">
              <AssemblyChecks assembly={assembly} />
            </PanelBoundary>
          </CardBody>
        </Card>
        <Card labelledBy={ids.history} className="lg:col-span-2">
          <CardHeader title="History" titleId={ids.history} description="Newest first. Nothing is deleted: corrections void a record with a reason." />
          <CardBody>
            <PanelBoundary title="The history could not be shown">
              <History assemblyId={assembly.id} canVoid={hasAbility(me, 'events.void')} />
            </PanelBoundary>
          </CardBody>
        </Card>
      </div>
    </>
  );
}

function History({ assemblyId, canVoid }: { assemblyId: string; canVoid: boolean }) {
  const me = useCurrentUser();
  const events = useAssemblyEvents(assemblyId);
  if (events.isPending) return <SkeletonBlock label="Loading the history…" lines={4} />;
  if (events.isError) return <ErrorState title="The history could not be loaded" error={events.error} onRetry={() => void events.refetch()} retrying={events.isFetching} />;
  return <AssemblyTimeline events={events.data} units={me.preferences} canVoid={canVoid} />;
}
