import { describeError } from '@/lib/api-client';
import { hasAbility, useCurrentUser } from '@/lib/auth';
import { Button, type ButtonVariant } from '@/components/ui/button';
import { DownloadIcon } from '@/components/ui/icons';
import { useToast } from '@/components/ui/toast';
import { useDownloadAssemblyExport } from '../api/export-assemblies';

interface ExportCsvButtonProps {
  /** The register's current query string (filters and sort); paging is left out of the download. */
  search: string | URLSearchParams;
  variant?: ButtonVariant;
  className?: string;
}

/** Downloads the register's current view as a CSV file, every row of it. Shown only to those who may export. */
export function ExportCsvButton({ search, variant = 'secondary', className }: ExportCsvButtonProps) {
  const user = useCurrentUser();
  const toast = useToast();
  const download = useDownloadAssemblyExport({
    onSuccess: (fileName) => toast.show({ title: 'Export downloaded', description: fileName }),
    onError: (error) => toast.show({ tone: 'error', title: 'The export could not be made', description: describeError(error) }),
  });
  if (!hasAbility(user, 'register.export')) return null;
  return (
    <Button variant={variant} className={className} icon={<DownloadIcon />} loading={download.isPending} onClick={() => download.mutate(search)}>
      {download.isPending ? 'Preparing CSV…' : 'Export CSV'}
    </Button>
  );
}
