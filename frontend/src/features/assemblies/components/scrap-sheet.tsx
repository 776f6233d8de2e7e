import { useForm } from 'react-hook-form';
import { scrapSchema, type AssemblyDto } from '@shared/schemas/assemblies.schema';
import { formatTagCode } from '@shared/tags/tag-code';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { FormSheet, FormSheetActions } from '@/components/ui/form-sheet';
import { useToast } from '@/components/ui/toast';
import { useScrapAssembly, type ScrapRequest } from '../api/scrap-assembly';
import { useSubmissionKey } from '../hooks/use-submission-key';
import { EVENT_FIELD_DEFAULTS, type EventFieldValues } from './event-fields';
import { requestResolver } from './form-values';
import { applySubmissionError, ServerMessage } from './server-message';
import { TextAreaField } from './text-area-field';

const toRequest = (v: EventFieldValues): ScrapRequest => ({ note: v.note });

interface SheetProps {
  assembly: AssemblyDto;
  open: boolean;
  onClose: () => void;
}

export function ScrapSheet({ open, onClose, assembly }: SheetProps) {
  return (
    <FormSheet open={open} onClose={onClose} title="Scrap" description={`Assembly ${formatTagCode(assembly.number)}, ${assembly.construction.code}`}>
      <ScrapForm assembly={assembly} onClose={onClose} />
    </FormSheet>
  );
}

function ScrapForm({ assembly, onClose }: Omit<SheetProps, 'open'>) {
  const toast = useToast();
  const submission = useSubmissionKey();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<EventFieldValues>({ resolver: requestResolver(scrapSchema, toRequest), mode: 'onChange', defaultValues: EVENT_FIELD_DEFAULTS });
  const scrap = useScrapAssembly({
    onSuccess: (answer) => {
      toast.show({ title: 'Scrapped', description: `${formatTagCode(answer.data.number)} is scrapped. Cut it so it cannot be used again.` });
      onClose();
    },
  });
  const onSubmit = handleSubmit((values) =>
    submission.once((idempotencyKey) =>
      scrap.mutateAsync({ assemblyId: assembly.id, input: toRequest(values), idempotencyKey }, { onError: (error) => applySubmissionError(error, setError, ['note']) }),
    ),
  );
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label="Scrap">
      <Alert tone="info" title="Scrapping is final">
        A scrapped assembly never goes back into stock or service. Its history stays in the register. Cut or mark the hose so nobody fits it by mistake.
      </Alert>
      <ServerMessage error={errors.root?.server} assemblyId={assembly.id} onReload={onClose} />
      <TextAreaField label="Why it is scrapped" error={errors.note?.message} data-autofocus {...register('note')} />
      <FormSheetActions>
        <Button variant="secondary" onClick={onClose}>
          Cancel
        </Button>
        <Button type="submit" variant="danger" size="lg" loading={scrap.isPending}>
          Scrap assembly
        </Button>
      </FormSheetActions>
    </form>
  );
}
