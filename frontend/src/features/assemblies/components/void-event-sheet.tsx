import { useForm } from 'react-hook-form';
import { voidEventSchema, type AssemblyEventDto } from '@shared/schemas/assemblies.schema';
import { formatDateTime } from '@/lib/format';
import { Button } from '@/components/ui/button';
import { FormSheet, FormSheetActions } from '@/components/ui/form-sheet';
import { useToast } from '@/components/ui/toast';
import { useVoidEvent, type VoidRequest } from '../api/void-event';
import { useSubmissionKey } from '../hooks/use-submission-key';
import { requestResolver } from './form-values';
import { EVENT_KIND_LABELS } from './labels';
import { applySubmissionError, ServerMessage } from './server-message';
import { TextAreaField } from './text-area-field';

interface VoidValues {
  reason: string;
}

const toRequest = (v: VoidValues): VoidRequest => ({ reason: v.reason });

/** Voids one proof test, inspection or note with a reason. The event stays, struck through. */
export function VoidEventSheet({ event, onClose }: { event: AssemblyEventDto; onClose: () => void }) {
  const kind = EVENT_KIND_LABELS[event.kind].toLowerCase();
  return (
    <FormSheet open onClose={onClose} title={`Void this ${kind}?`} description={`Recorded for ${formatDateTime(event.occurredAt)}${event.actorName ? ` by ${event.actorName}` : ''}.`}>
      <VoidForm event={event} onClose={onClose} />
    </FormSheet>
  );
}

function VoidForm({ event, onClose }: { event: AssemblyEventDto; onClose: () => void }) {
  const toast = useToast();
  const submission = useSubmissionKey();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<VoidValues>({ resolver: requestResolver(voidEventSchema, toRequest), mode: 'onChange', defaultValues: { reason: '' } });
  const voidIt = useVoidEvent({
    onSuccess: () => {
      toast.show({ title: 'Voided', description: 'The record stays in the history, struck through, with your reason.' });
      onClose();
    },
  });
  const onSubmit = handleSubmit((values) =>
    submission.once((idempotencyKey) =>
      voidIt.mutateAsync({ eventId: event.id, input: toRequest(values), idempotencyKey }, { onError: (error) => applySubmissionError(error, setError, ['reason']) }),
    ),
  );
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label="Void">
      <p className="text-ink-800">Nothing is deleted. The {EVENT_KIND_LABELS[event.kind].toLowerCase()} stays in the history, struck through, with your reason beside it.</p>
      <ServerMessage error={errors.root?.server} />
      <TextAreaField label="Why it is wrong" hint="At least 10 characters." error={errors.reason?.message} data-autofocus {...register('reason')} />
      <FormSheetActions>
        <Button variant="secondary" onClick={onClose}>
          Cancel
        </Button>
        <Button type="submit" variant="danger" size="lg" loading={voidIt.isPending}>
          Void it
        </Button>
      </FormSheetActions>
    </form>
  );
}
