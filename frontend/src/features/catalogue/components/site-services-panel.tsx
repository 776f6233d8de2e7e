import { useState } from 'react';
import { countOf } from '@/lib/format';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useReference } from '../api/get-reference';
import { useSiteServices } from '../api/get-site-services';
import { ServiceCard } from './service-card';

interface SiteServicesPanelProps {
  siteId: string;
  siteName: string;
  canEdit: boolean;
}

/** Every service of the catalogue as one site has it. */
export function SiteServicesPanel({ siteId, siteName, canEdit }: SiteServicesPanelProps) {
  const services = useSiteServices(siteId);
  // The sources of the defaults come with the reference lists; the settings show without them if those fail.
  const reference = useReference();
  const [open, setOpen] = useState<ReadonlySet<string>>(new Set());

  if (services.isPending) return <SkeletonBlock label={`Loading the services at ${siteName}…`} lines={8} />;
  if (services.isError) {
    return <ErrorState title="The services could not be loaded" error={services.error} onRetry={() => void services.refetch()} retrying={services.isFetching} />;
  }
  if (services.data.length === 0) {
    return <EmptyState title="No services at this site">The server lists no services for {siteName}. The catalogue's services appear here once the site has them.</EmptyState>;
  }

  const customised = services.data.filter((s) => s.customised).length;
  const allOpen = open.size === services.data.length;
  const toggle = (code: string) =>
    setOpen((current) => {
      const next = new Set(current);
      if (next.has(code)) next.delete(code);
      else next.add(code);
      return next;
    });

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p className="text-lg font-semibold text-ink-950" aria-live="polite">
          {countOf(services.data.length, 'service')}
          <span className="font-normal text-ink-700"> · {customised === 0 ? 'all at the catalogue defaults' : `${customised} changed at this site`}</span>
        </p>
        <Button variant="ghost" onClick={() => setOpen(allOpen ? new Set() : new Set(services.data.map((s) => s.serviceCode)))}>
          {allOpen ? 'Close all' : 'Open all'}
        </Button>
      </div>
      {reference.isError ? (
        <ErrorState
          title="The sources of the defaults could not be loaded"
          error={reference.error}
          onRetry={() => void reference.refetch()}
          retrying={reference.isFetching}
        />
      ) : null}
      <ul className="flex flex-col gap-3" aria-label={`Services at ${siteName}`}>
        {services.data.map((service) => (
          <ServiceCard
            key={service.serviceCode}
            service={service}
            definition={reference.data?.services.find((d) => d.code === service.serviceCode)}
            siteName={siteName}
            canEdit={canEdit}
            expanded={open.has(service.serviceCode)}
            onToggle={() => toggle(service.serviceCode)}
          />
        ))}
      </ul>
    </div>
  );
}
