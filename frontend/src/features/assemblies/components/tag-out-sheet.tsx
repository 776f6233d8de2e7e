import { useForm } from 'react-hook-form';
import { tagOutSchema, type AssemblyDto } from '@shared/schemas/assemblies.schema';
import { formatTagCode } from '@shared/tags/tag-code';
import { Button } from '@/components/ui/button';
import { FormSheet, FormSheetActions } from '@/components/ui/form-sheet';
import { useToast } from '@/components/ui/toast';
import { useTagOutAssembly, type TagOutRequest } from '../api/tag-out-assembly';
import { useEquipmentHasHourMeter } from '../hooks/use-equipment-has-hour-meter';
import { useSubmissionKey } from '../hooks/use-submission-key';
import { Cautions } from './cautions';
import { EVENT_FIELD_DEFAULTS, EVENT_FIELD_NAMES, EventFields, eventRequestFields, type EventFieldValues } from './event-fields';
import { requestResolver } from './form-values';
import { applySubmissionError, ServerMessage } from './server-message';
import { TextAreaField } from './text-area-field';

type TagOutValues = EventFieldValues;

const toRequest = (v: TagOutValues): TagOutRequest => ({ ...eventRequestFields(v), note: v.note });

interface SheetProps {
  assembly: AssemblyDto;
  cautions: string[];
  open: boolean;
  onClose: () => void;
}

export function TagOutSheet({ open, onClose, ...props }: SheetProps) {
  return (
    <FormSheet open={open} onClose={onClose} title="Tag out" description={`Assembly ${formatTagCode(props.assembly.number)} at ${props.assembly.position?.code ?? 'its position'}: not to be used until it is replaced or removed.`}>
      <TagOutForm {...props} onClose={onClose} />
    </FormSheet>
  );
}

function TagOutForm({ assembly, cautions, onClose }: Omit<SheetProps, 'open'>) {
  const toast = useToast();
  const submission = useSubmissionKey();
  const hourMeter = useEquipmentHasHourMeter(assembly.position?.id);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<TagOutValues>({ resolver: requestResolver(tagOutSchema, toRequest), mode: 'onChange', defaultValues: EVENT_FIELD_DEFAULTS });
  const tagOut = useTagOutAssembly({
    onSuccess: (answer) => {
      toast.show({ title: 'Tagged out', description: `${formatTagCode(answer.data.number)} is tagged out. Hang the tag at the hose.` });
      onClose();
    },
  });
  const onSubmit = handleSubmit((values) =>
    submission.once((idempotencyKey) =>
      tagOut.mutateAsync({ assemblyId: assembly.id, input: toRequest(values), idempotencyKey }, { onError: (error) => applySubmissionError(error, setError, EVENT_FIELD_NAMES) }),
    ),
  );
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label="Tag out">
      <ServerMessage error={errors.root?.server} assemblyId={assembly.id} onReload={onClose} />
      <TextAreaField label="Why it is tagged out" hint="What you found, so the next person knows." error={errors.note?.message} data-autofocus {...register('note')} />
      <EventFields register={register} errors={errors} hourMeter={hourMeter} withoutNote />
      <Cautions cautions={cautions} />
      <FormSheetActions>
        <Button variant="secondary" onClick={onClose}>
          Cancel
        </Button>
        <Button type="submit" variant="danger" size="lg" loading={tagOut.isPending}>
          Tag out
        </Button>
      </FormSheetActions>
    </form>
  );
}
