import { useForm } from 'react-hook-form';
import { removeSchema, type AssemblyDto } from '@shared/schemas/assemblies.schema';
import { REMOVAL_REASON_DEFINITIONS, type RemovalReason } from '@shared/services/removal-reasons';
import { formatTagCode } from '@shared/tags/tag-code';
import { Button } from '@/components/ui/button';
import { FormSheet, FormSheetActions } from '@/components/ui/form-sheet';
import { useToast } from '@/components/ui/toast';
import { useRemoveAssembly, type RemoveRequest } from '../api/remove-assembly';
import { useEquipmentHasHourMeter } from '../hooks/use-equipment-has-hour-meter';
import { useSubmissionKey } from '../hooks/use-submission-key';
import { Cautions } from './cautions';
import { ChoiceTiles } from './choice-tiles';
import { EVENT_FIELD_DEFAULTS, EVENT_FIELD_NAMES, EventFields, eventRequestFields, type EventFieldValues } from './event-fields';
import { requestResolver } from './form-values';
import { removalReasonLabel } from './labels';
import { applySubmissionError, ServerMessage } from './server-message';

interface RemoveValues extends EventFieldValues {
  reason: RemovalReason | '';
}

const FIELDS = ['reason', ...EVENT_FIELD_NAMES] as const;

const toRequest = (v: RemoveValues): RemoveRequest => ({ ...eventRequestFields(v), reason: (v.reason || undefined) as RemovalReason });

export const REMOVAL_REASON_OPTIONS = REMOVAL_REASON_DEFINITIONS.map((r) => ({ value: r.code, label: r.label, description: r.description }));

interface SheetProps {
  assembly: AssemblyDto;
  cautions: string[];
  open: boolean;
  onClose: () => void;
}

export function RemoveSheet({ open, onClose, ...props }: SheetProps) {
  return (
    <FormSheet
      open={open}
      onClose={onClose}
      size="lg"
      title="Remove from service"
      description={`Assembly ${formatTagCode(props.assembly.number)} comes out of ${props.assembly.position?.code ?? 'its position'} and nothing goes in. To put another in, use Replace instead.`}
    >
      <RemoveForm {...props} onClose={onClose} />
    </FormSheet>
  );
}

function RemoveForm({ assembly, cautions, onClose }: Omit<SheetProps, 'open'>) {
  const toast = useToast();
  const submission = useSubmissionKey();
  const hourMeter = useEquipmentHasHourMeter(assembly.position?.id);
  const {
    register,
    handleSubmit,
    setError,
    watch,
    setValue,
    formState: { errors },
  } = useForm<RemoveValues>({ resolver: requestResolver(removeSchema, toRequest), mode: 'onChange', defaultValues: { ...EVENT_FIELD_DEFAULTS, reason: '' } });
  const remove = useRemoveAssembly({
    onSuccess: (answer, variables) => {
      toast.show({ title: 'Removed', description: `${formatTagCode(answer.data.number)} is out of service: ${removalReasonLabel(variables.input.reason).toLowerCase()}.` });
      onClose();
    },
  });
  const onSubmit = handleSubmit((values) =>
    submission.once((idempotencyKey) =>
      remove.mutateAsync({ assemblyId: assembly.id, input: toRequest(values), idempotencyKey }, { onError: (error) => applySubmissionError(error, setError, FIELDS) }),
    ),
  );
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label="Remove from service">
      <ServerMessage error={errors.root?.server} assemblyId={assembly.id} onReload={onClose} />
      <ChoiceTiles
        legend="Why did it come out?"
        options={REMOVAL_REASON_OPTIONS}
        value={watch('reason') || null}
        onChange={(reason) => setValue('reason', reason, { shouldValidate: true })}
        error={errors.reason?.message}
      />
      <EventFields register={register} errors={errors} hourMeter={hourMeter} />
      <Cautions cautions={cautions} />
      <FormSheetActions>
        <Button variant="secondary" onClick={onClose}>
          Cancel
        </Button>
        <Button type="submit" variant="danger" size="lg" loading={remove.isPending}>
          Remove from service
        </Button>
      </FormSheetActions>
    </form>
  );
}
