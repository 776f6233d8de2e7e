import type { AssemblyDto } from '@shared/schemas/assemblies.schema';
import type { RemovalReason } from '@shared/services/removal-reasons';
import { formatTagCode } from '@shared/tags/tag-code';
import { paths } from '@/config/paths';
import { ButtonLink, TextLink } from '@/components/ui/button';
import { CheckIcon } from '@/components/ui/icons';
import { OutcomeBadge, StatusBadge } from '../assembly-badges';
import { removalReasonLabel } from '../labels';

/** What the server did, from its answer: the old assembly out with its reason, the new one in. */
export function ReplaceDone({ old, installed, reason }: { old: AssemblyDto; installed: AssemblyDto; reason: RemovalReason }) {
  const position = installed.position;
  return (
    <div className="flex flex-col gap-5" role="status">
      <div className="flex items-center gap-3 rounded-[var(--radius-control)] border-l-4 border-success-700 bg-success-100 px-4 py-4">
        <CheckIcon className="size-8 shrink-0 text-success-700" />
        <div>
          <h2 className="text-2xl font-bold text-ink-950">Saved</h2>
          <p className="text-ink-900">The replacement is recorded.</p>
        </div>
      </div>
      <ul className="flex flex-col gap-3">
        <li className="flex flex-col gap-1 rounded-[var(--radius-control)] border-2 border-ink-300 bg-white px-4 py-3">
          <p className="text-sm font-semibold tracking-wide text-ink-600 uppercase">Removed</p>
          <TextLink to={paths.assemblies.detail.getHref(old.id)} className="self-start font-mono text-xl tracking-wider">
            {formatTagCode(old.number)}
          </TextLink>
          <p className="text-ink-900">
            Taken out of <span className="font-mono font-semibold">{old.position?.code ?? position?.code}</span>: {removalReasonLabel(reason).toLowerCase()}.
          </p>
        </li>
        <li className="flex flex-col gap-1 rounded-[var(--radius-control)] border-2 border-success-700 bg-white px-4 py-3">
          <p className="text-sm font-semibold tracking-wide text-success-700 uppercase">Installed</p>
          <TextLink to={paths.assemblies.detail.getHref(installed.id)} className="self-start font-mono text-xl tracking-wider">
            {formatTagCode(installed.number)}
          </TextLink>
          <p className="text-ink-900">
            Now at <span className="font-mono font-semibold">{position?.code}</span> {position?.name}
            {position ? `, ${position.equipmentName}` : ''}.
          </p>
          <p className="flex flex-wrap gap-2">
            <StatusBadge status={installed.status} />
            <OutcomeBadge outcome={installed.checkOutcome} overridden={installed.overridden} />
          </p>
        </li>
      </ul>
      <p className="text-ink-800">Hang the new assembly’s tag at the hose. Put the old one aside for inspection, or scrap it.</p>
      <div className="flex flex-col gap-3 sm:flex-row">
        <ButtonLink to={paths.assemblies.detail.getHref(installed.id)} variant="primary" size="lg">
          Open {formatTagCode(installed.number)}
        </ButtonLink>
        {position ? (
          <ButtonLink to={paths.positions.detail.getHref(position.id)} size="lg">
            Open position {position.code}
          </ButtonLink>
        ) : null}
        <ButtonLink to={paths.find.getHref()} size="lg">
          Find another hose
        </ButtonLink>
      </div>
    </div>
  );
}
