import { useForm } from 'react-hook-form';
import type { SelectionCheckCode } from '@shared/checks/types';
import { overrideCreateSchema, type AssemblyDto } from '@shared/schemas/assemblies.schema';
import { formatTagCode } from '@shared/tags/tag-code';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Checkbox } from '@/components/ui/checkbox';
import { FieldError, TextField } from '@/components/ui/field';
import { FormSheet, FormSheetActions } from '@/components/ui/form-sheet';
import { useToast } from '@/components/ui/toast';
import { useOverrideChecks, type OverrideRequest } from '../api/override-checks';
import { useSubmissionKey } from '../hooks/use-submission-key';
import { CheckResultList } from './check-results';
import { daysFromToday, requestResolver } from './form-values';
import { checkLabel } from './labels';
import { applySubmissionError, ServerMessage } from './server-message';
import { TextAreaField } from './text-area-field';

interface OverrideValues {
  checks: SelectionCheckCode[];
  reason: string;
  reviewOn: string;
}

const FIELDS = ['checks', 'reason', 'reviewOn'] as const;
const toRequest = (v: OverrideValues): OverrideRequest => ({ checks: v.checks, reason: v.reason, reviewOn: v.reviewOn });

/** The failing checks of an installed assembly that a competent person may still accept. */
export function overridableFails(assembly: AssemblyDto) {
  const accepted = new Set(assembly.overrides.map((o) => o.checkCode));
  return (assembly.checkResults ?? []).filter((r) => r.outcome === 'fail' && r.overridable && !accepted.has(r.check));
}

interface SheetProps {
  assembly: AssemblyDto;
  open: boolean;
  onClose: () => void;
}

export function OverrideSheet({ open, onClose, assembly }: SheetProps) {
  return (
    <FormSheet open={open} onClose={onClose} title="Accept failed checks" description={`Assembly ${formatTagCode(assembly.number)} at ${assembly.position?.code ?? 'its position'}`}>
      <OverrideForm assembly={assembly} onClose={onClose} />
    </FormSheet>
  );
}

function OverrideForm({ assembly, onClose }: Omit<SheetProps, 'open'>) {
  const toast = useToast();
  const submission = useSubmissionKey();
  const fails = overridableFails(assembly);
  const hardFails = (assembly.checkResults ?? []).filter((r) => r.outcome === 'fail' && !r.overridable);
  const {
    register,
    handleSubmit,
    setError,
    watch,
    setValue,
    formState: { errors },
  } = useForm<OverrideValues>({
    resolver: requestResolver(overrideCreateSchema, toRequest),
    mode: 'onChange',
    defaultValues: { checks: fails.map((f) => f.check), reason: '', reviewOn: daysFromToday(30) },
  });
  const override = useOverrideChecks({
    onSuccess: () => {
      toast.show({ title: 'Override recorded', description: 'It shows on the assembly until it is reviewed.' });
      onClose();
    },
  });
  const chosen = watch('checks');
  const toggle = (code: SelectionCheckCode, on: boolean) =>
    setValue('checks', on ? [...chosen.filter((c) => c !== code), code] : chosen.filter((c) => c !== code), { shouldValidate: true });
  const onSubmit = handleSubmit((values) =>
    submission.once((idempotencyKey) =>
      override.mutateAsync({ assemblyId: assembly.id, input: toRequest(values), idempotencyKey }, { onError: (error) => applySubmissionError(error, setError, FIELDS) }),
    ),
  );
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label="Accept failed checks">
      <ServerMessage error={errors.root?.server} assemblyId={assembly.id} onReload={onClose} />
      {hardFails.length ? (
        <Alert tone="danger" title="Some fails cannot be overridden">
          <CheckResultList results={hardFails} showSources={false} className="mt-1" />
          <p className="mt-2">
            The only way past these is a change of the position’s design conditions or a new proof test that passes. Until then, the assembly should be tagged out or replaced.
          </p>
        </Alert>
      ) : null}
      {fails.length ? (
        <>
          <CheckResultList results={fails} showSources={false} />
          <fieldset className="flex flex-col gap-1" aria-describedby={errors.checks ? 'override-sheet-checks-error' : undefined}>
            <legend className="mb-1 font-semibold text-ink-900">Checks you accept</legend>
            {fails.map((f) => (
              <Checkbox key={f.check} label={checkLabel(f.check)} checked={chosen.includes(f.check)} onChange={(event) => toggle(f.check, event.target.checked)} />
            ))}
            <FieldError id="override-sheet-checks-error" message={errors.checks?.message} />
          </fieldset>
          <TextAreaField label="Why it is acceptable" hint="At least 10 characters: what makes it safe, and what will change." error={errors.reason?.message} data-autofocus {...register('reason')} />
          <TextField label="Review by" type="date" error={errors.reviewOn?.message} {...register('reviewOn')} />
        </>
      ) : (
        <Alert tone="info">No failed check is waiting to be accepted.</Alert>
      )}
      <FormSheetActions>
        <Button variant="secondary" onClick={onClose}>
          Cancel
        </Button>
        {fails.length ? (
          <Button type="submit" size="lg" loading={override.isPending}>
            Record override
          </Button>
        ) : null}
      </FormSheetActions>
    </form>
  );
}
