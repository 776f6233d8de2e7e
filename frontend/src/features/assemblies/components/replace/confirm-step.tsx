import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { replaceSchema, type AssemblyDto, type OverrideInput } from '@shared/schemas/assemblies.schema';
import type { RemovalReason } from '@shared/services/removal-reasons';
import { formatTagCode } from '@shared/tags/tag-code';
import { hasAbility, useCurrentUser } from '@/lib/auth';
import { isApiError } from '@/lib/api-client';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useAssembly } from '../../api/get-assembly';
import type { LifecycleAnswer } from '../../api/lifecycle-mutation';
import { useReplaceAssembly, type ReplaceRequest } from '../../api/replace-assembly';
import { outcomeUnknown } from '../../api/submit-once';
import { useEquipmentHasHourMeter } from '../../hooks/use-equipment-has-hour-meter';
import { Cautions } from '../cautions';
import { ChecksRefusal, checksRefusalOf } from '../checks-refusal';
import { EVENT_FIELD_DEFAULTS, EventFields, eventRequestFields, type EventFieldValues } from '../event-fields';
import { requestResolver, submittedEarlier } from '../form-values';
import { removalReasonLabel } from '../labels';
import { PreviewChecks } from '../preview-checks';
import { NO_ANSWER, SAVED_EARLIER } from '../server-message';

interface ConfirmStepProps {
  old: AssemblyDto;
  cautions: string[];
  reason: RemovalReason;
  newAssemblyId: string;
  /** The submission's key, kept by the flow across every retry. */
  submission: { once: (send: (key: string) => Promise<unknown>) => Promise<void> };
  onChangeReason: () => void;
  onChangeNew: () => void;
  onReplaced: (answer: LifecycleAnswer, reason: RemovalReason) => void;
}

/** Step 4: what comes out and what goes in, the checks of the new one at the position, and the one button that does it. */
export function ConfirmStep({ old, cautions, reason, newAssemblyId, submission, onChangeReason, onChangeNew, onReplaced }: ConfirmStepProps) {
  const me = useCurrentUser();
  const incoming = useAssembly(newAssemblyId);
  const hourMeter = useEquipmentHasHourMeter(old.position?.id);
  const [moreOpen, setMoreOpen] = useState(false);

  const toRequest = (values: EventFieldValues): ReplaceRequest => ({ ...eventRequestFields(values), newAssemblyId, reason });
  const {
    register,
    handleSubmit,
    formState: { errors },
  } = useForm<EventFieldValues>({ resolver: requestResolver(replaceSchema, toRequest), mode: 'onChange', defaultValues: EVENT_FIELD_DEFAULTS });

  const replace = useReplaceAssembly({ onSuccess: (answer) => onReplaced(answer, reason) });
  const refusal = checksRefusalOf(replace.error);

  const send = (values: EventFieldValues, override?: OverrideInput) =>
    submission.once((idempotencyKey) => replace.mutateAsync({ assemblyId: old.id, input: { ...toRequest(values), ...(override ? { override } : {}) }, idempotencyKey }));
  const onSubmit = handleSubmit((values) => send(values));

  if (incoming.isPending) return <SkeletonBlock label="Loading the new assembly…" lines={4} />;
  if (incoming.isError) {
    return <ErrorState title="The new assembly could not be loaded" error={incoming.error} onRetry={() => void incoming.refetch()} retrying={incoming.isFetching} />;
  }
  const fresh = incoming.data.assembly;
  const error = replace.error;

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label="Confirm the replacement">
      <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
        <section aria-label="Coming out" className="flex flex-col gap-1 rounded-[var(--radius-control)] border-2 border-ink-300 bg-white px-4 py-3">
          <p className="text-sm font-semibold tracking-wide text-ink-600 uppercase">Coming out</p>
          <p className="font-mono text-2xl font-bold tracking-wider text-ink-950">{formatTagCode(old.number)}</p>
          <p className="text-ink-800">
            from <span className="font-mono font-semibold">{old.position?.code}</span> {old.position?.name}
          </p>
          <p className="flex flex-wrap items-center gap-x-2 text-ink-900">
            <span>
              Reason: <span className="font-semibold">{removalReasonLabel(reason)}</span>
            </span>
            <Button variant="ghost" onClick={onChangeReason} className="-ml-2">
              Change
            </Button>
          </p>
        </section>
        <section aria-label="Going in" className="flex flex-col gap-1 rounded-[var(--radius-control)] border-2 border-copper-700 bg-copper-50 px-4 py-3">
          <p className="text-sm font-semibold tracking-wide text-copper-800 uppercase">Going in</p>
          <p className="font-mono text-2xl font-bold tracking-wider text-ink-950">{formatTagCode(fresh.number)}</p>
          <p className="text-ink-800">
            <span className="font-mono font-semibold">{fresh.construction.code}</span> {fresh.construction.name}
          </p>
          <p>
            <Button variant="ghost" onClick={onChangeNew} className="-ml-2">
              Choose another
            </Button>
          </p>
        </section>
      </div>

      <PreviewChecks assembly={fresh} positionId={old.position?.id ?? null} />

      {moreOpen ? (
        <EventFields register={register} errors={errors} hourMeter={hourMeter} />
      ) : (
        <Button variant="secondary" onClick={() => setMoreOpen(true)} className="self-start">
          Add work order, hour meter or note
        </Button>
      )}

      <Cautions cautions={cautions} title="Isolate, lock out and bleed down first" />

      {refusal ? (
        <ChecksRefusal
          refusal={refusal}
          message={error?.message ?? ''}
          canOverride={hasAbility(me, 'checks.override')}
          overriding={replace.isPending}
          overrideLabel="Replace with override"
          onOverride={(override) => void handleSubmit((values) => send(values, override))()}
        />
      ) : error ? (
        <Alert tone="danger" title={outcomeUnknown(error) ? 'Not saved yet' : 'Not done'}>
          {outcomeUnknown(error) ? NO_ANSWER : submittedEarlier(error) ? SAVED_EARLIER : error.message}
          {isApiError(error) && error.field === 'newAssemblyId' ? (
            <Button variant="secondary" className="mt-2" onClick={onChangeNew}>
              Choose another assembly
            </Button>
          ) : null}
        </Alert>
      ) : null}

      {refusal ? null : (
        <Button type="submit" size="lg" className="min-h-16 w-full text-xl" loading={replace.isPending}>
          {outcomeUnknown(error) ? 'Try again' : 'Confirm replacement'}
        </Button>
      )}
    </form>
  );
}
