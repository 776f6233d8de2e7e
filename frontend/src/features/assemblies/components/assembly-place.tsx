import { Link } from 'react-router-dom';
import type { AssemblyDto } from '@shared/schemas/assemblies.schema';
import { serviceByCode } from '@shared/services/service-catalogue';
import { paths } from '@/config/paths';
import { formatDate, formatDateTime } from '@/lib/format';
import { Badge } from '@/components/ui/badge';
import { Fact, FactList, NotRecorded } from './fact-list';
import { todayIso } from './form-values';

/** Whole days from one ISO date to another (positive when `to` is later). */
function daysBetween(from: string, to: string): number {
  return Math.round((Date.parse(`${to.slice(0, 10)}T00:00:00Z`) - Date.parse(`${from.slice(0, 10)}T00:00:00Z`)) / 86_400_000);
}

export function InspectionDue({ due, today = todayIso() }: { due: string; today?: string }) {
  const days = daysBetween(today, due);
  if (days < 0) {
    return (
      <span className="flex flex-wrap items-center gap-2">
        <span className="font-bold text-danger-800">{formatDate(due)}</span>
        <Badge tone="danger">Overdue by {-days === 1 ? '1 day' : `${-days} days`}</Badge>
      </span>
    );
  }
  return (
    <span className="flex flex-wrap items-center gap-2">
      <span>{formatDate(due)}</span>
      {days <= 7 ? <Badge tone="accent">{days === 0 ? 'Due today' : `Due in ${days === 1 ? '1 day' : `${days} days`}`}</Badge> : null}
    </span>
  );
}

/** Where the assembly is: its site, and the position, equipment and area it is installed at. */
export function AssemblyPlace({ assembly }: { assembly: AssemblyDto }) {
  const a = assembly;
  const position = a.position;
  if (!position) {
    const where =
      a.status === 'in_stock' || a.status === 'built'
        ? `In the store at ${a.siteName}${a.storeLocation ? `, ${a.storeLocation}` : ''}.`
        : a.status === 'removed'
          ? `Out of service at ${a.siteName}, waiting for inspection and re-test or scrapping.`
          : `Scrapped at ${a.siteName}.`;
    return (
      <FactList>
        <Fact label="Site">{a.siteName}</Fact>
        <Fact label="Store location">{a.storeLocation ?? <NotRecorded />}</Fact>
        <Fact label="Installed" wide>
          Not installed. {where}
        </Fact>
      </FactList>
    );
  }
  return (
    <FactList>
      <Fact label="Site">{a.siteName}</Fact>
      <Fact label="Position">
        <Link
          to={paths.positions.detail.getHref(position.id)}
          className="-my-2 flex min-h-11 flex-wrap items-center gap-x-1.5 py-1 font-semibold text-copper-700 underline decoration-2 underline-offset-4 hover:text-copper-800"
        >
          <span className="font-mono whitespace-nowrap">{position.code}</span>
          <span>{position.name}</span>
        </Link>
      </Fact>
      <Fact label="Equipment">
        {position.equipmentAssetNumber ? <span className="font-mono font-semibold">{position.equipmentAssetNumber} </span> : null}
        {position.equipmentName}
      </Fact>
      <Fact label="Area">{position.areaName}</Fact>
      <Fact label="Service">{serviceByCode(position.serviceCode)?.name ?? position.serviceCode}</Fact>
      <Fact label="Installed on">
        {a.installedAt ? (
          <>
            {formatDateTime(a.installedAt)}
            {a.installedAtEstimated ? <span className="text-ink-600"> (estimated)</span> : null}
          </>
        ) : (
          <NotRecorded />
        )}
      </Fact>
      <Fact label="Next inspection due">{a.nextInspectionDue ? <InspectionDue due={a.nextInspectionDue} /> : <NotRecorded>Not scheduled</NotRecorded>}</Fact>
      <Fact label="Last inspected">{a.lastInspectedAt ? formatDateTime(a.lastInspectedAt) : <NotRecorded>Not inspected since it was installed</NotRecorded>}</Fact>
    </FactList>
  );
}
