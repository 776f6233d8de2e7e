import { useCallback, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { ImportKind } from '@shared/schemas/csv.schema';
import { paths } from '@/config/paths';
import { RequireAbility } from '@/lib/auth';
import { ButtonLink } from '@/components/ui/button';
import { Card, CardBody, CardHeader } from '@/components/ui/card';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { UploadIcon } from '@/components/ui/icons';
import { ImportColumnsGuide } from '@/features/csv/components/import-columns-guide';
import { ImportForm } from '@/features/csv/components/import-form';
import { ImportJobPanel } from '@/features/csv/components/import-job-panel';
import { RecentImports } from '@/features/csv/components/recent-imports';
import { PageHeader } from '../page-header';

export function ImportPage() {
  return (
    <RequireAbility action="imports.run">
      <ImportScreen />
    </RequireAbility>
  );
}

/** Upload, check and write a CSV file of constructions, positions or assemblies; the job in the address survives a reload. */
function ImportScreen() {
  const [search, setSearch] = useSearchParams();
  const jobId = search.get('job');
  const [kind, setKind] = useState<ImportKind>('assemblies');
  const onKindChange = useCallback((next: ImportKind) => setKind(next), []);

  if (jobId) {
    const startAgain = (
      <ButtonLink to={paths.importCsv.getHref()} icon={<UploadIcon />}>
        Upload another file
      </ButtonLink>
    );
    return (
      <>
        <PageHeader title="Import from CSV" description="The file is checked in full before anything is written." />
        <PanelBoundary title="The import could not be shown">
          <ImportJobPanel key={jobId} jobId={jobId} startAgain={startAgain} />
        </PanelBoundary>
      </>
    );
  }

  return (
    <>
      <PageHeader
        title="Import from CSV"
        description="Bring constructions, positions and assemblies in from a spreadsheet. Every row is checked first; nothing is written until the whole file is clean."
      />
      <div className="flex flex-col gap-6">
        <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(18rem,1fr)]">
          <Card labelledBy="import-upload">
            <CardHeader titleId="import-upload" title="Upload a file" />
            <CardBody>
              <PanelBoundary title="The upload form could not be shown">
                <ImportForm onKindChange={onKindChange} onUploaded={(job) => setSearch({ job: job.id })} />
              </PanelBoundary>
            </CardBody>
          </Card>
          <PanelBoundary title="Your recent imports could not be shown">
            <RecentImports />
          </PanelBoundary>
        </div>
        <PanelBoundary title="The columns could not be shown">
          <ImportColumnsGuide kind={kind} />
        </PanelBoundary>
      </div>
    </>
  );
}
