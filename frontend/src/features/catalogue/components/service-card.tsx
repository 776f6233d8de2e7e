import { useId, useState } from 'react';
import type { SiteServiceDto } from '@shared/schemas/register.schema';
import type { ServiceDefinition } from '@shared/services/service-catalogue';
import { cn } from '@/lib/cn';
import { ArchiveConfirmDialog } from '@/components/ui/archive-confirm-dialog';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { ArrowDownIcon, ArrowUpIcon } from '@/components/ui/icons';
import { useToast } from '@/components/ui/toast';
import { useResetSiteService } from '../api/reset-site-service';
import { CONDUCTIVITY_LABELS, days, labelOf } from '../utils/labels';
import { factorText, periodicTestText, ServiceSettingsView } from './service-settings-view';
import { ServiceSettingsForm } from './service-settings-form';

interface ServiceCardProps {
  service: SiteServiceDto;
  definition: ServiceDefinition | undefined;
  siteName: string;
  canEdit: boolean;
  expanded: boolean;
  onToggle: () => void;
}

/** A short line of a service's main numbers, read without opening the card. */
function summaryOf(service: SiteServiceDto): string {
  const { settings } = service;
  const factors = [...new Set(settings.designFactorBands.map((b) => factorText(b.factor)))].join(' to ');
  return [
    `Design factor ${factors}`,
    `inspect every ${days(settings.defaultInspectionIntervalDays)}`,
    settings.conductivityRequired === 'none' ? 'no conductivity requirement' : labelOf(CONDUCTIVITY_LABELS, settings.conductivityRequired)?.toLowerCase(),
    periodicTestText(settings.periodicTest).toLowerCase(),
  ].join(' · ');
}

/** One service at one site: its summary, and when opened its settings with their sources, or the form to change them. */
export function ServiceCard({ service, definition, siteName, canEdit, expanded, onToggle }: ServiceCardProps) {
  const toast = useToast();
  const titleId = useId();
  const bodyId = useId();
  const [editing, setEditing] = useState(false);
  const [resetting, setResetting] = useState(false);
  const reset = useResetSiteService({
    onSuccess: (saved) => {
      setResetting(false);
      toast.show({ title: `${saved.name} is back to the catalogue's defaults`, description: `At ${siteName}.` });
    },
  });
  const open = expanded || editing;

  return (
    <li aria-labelledby={titleId} className="rounded-[var(--radius-card)] border border-ink-200 bg-white shadow-sm">
      <div className="flex flex-wrap items-start justify-between gap-3 px-4 py-4 sm:px-5">
        <div className="flex min-w-0 flex-1 flex-col gap-1">
          <div className="flex flex-wrap items-center gap-2">
            <h3 id={titleId} className="text-lg font-bold text-ink-950">
              {service.name}
            </h3>
            {service.customised ? <Badge tone="accent">Changed at this site</Badge> : <Badge tone="neutral">Catalogue defaults</Badge>}
          </div>
          <p className="text-ink-700">{service.description}</p>
          <p className="text-sm font-semibold text-ink-800">{summaryOf(service)}</p>
        </div>
        <Button
          variant="secondary"
          onClick={onToggle}
          aria-expanded={open}
          aria-controls={bodyId}
          disabled={editing}
          icon={open ? <ArrowUpIcon className="size-5" /> : <ArrowDownIcon className="size-5" />}
          className="w-full sm:w-auto"
        >
          {open ? 'Hide settings' : 'Settings and sources'}
        </Button>
      </div>
      <div id={bodyId} hidden={!open} className={cn('border-t border-ink-100 px-4 py-4 sm:px-5')}>
        {open ? (
          <PanelBoundary title={`The settings of ${service.name} could not be shown`}>
            {editing ? (
              <ServiceSettingsForm
                service={service}
                onCancel={() => setEditing(false)}
                onSaved={(saved) => {
                  setEditing(false);
                  toast.show({ title: `${saved.name} saved`, description: `The assemblies in this service at ${siteName} are re-checked.` });
                }}
              />
            ) : (
              <div className="flex flex-col gap-5">
                <ServiceSettingsView service={service} definition={definition} />
                {canEdit ? (
                  <div className="flex flex-wrap gap-3">
                    <Button onClick={() => setEditing(true)}>Edit settings</Button>
                    {service.customised ? (
                      <Button
                        variant="secondary"
                        onClick={() => {
                          reset.reset();
                          setResetting(true);
                        }}
                      >
                        Back to defaults
                      </Button>
                    ) : null}
                  </div>
                ) : null}
              </div>
            )}
          </PanelBoundary>
        ) : null}
      </div>
      <ArchiveConfirmDialog
        open={resetting}
        onClose={() => setResetting(false)}
        onConfirm={() => reset.mutate({ siteId: service.siteId, serviceCode: service.serviceCode })}
        title={`Put ${service.name} back to the defaults?`}
        description={`Every setting of this service at ${siteName} returns to the catalogue's default, with its published source. The assemblies in this service there are re-checked.`}
        confirmLabel="Back to defaults"
        pending={reset.isPending}
        error={reset.error}
      />
    </li>
  );
}
