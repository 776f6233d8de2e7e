import { useForm } from 'react-hook-form';
import { defaultProofTestPressureKpa } from '@shared/checks/selection-checks';
import { PROOF_TEST_MEDIA, proofTestSchema, type AssemblyDto, type ProofTestMedium } from '@shared/schemas/assemblies.schema';
import { formatPressure, toKpa } from '@shared/units/units';
import { formatTagCode } from '@shared/tags/tag-code';
import { useCurrentUser } from '@/lib/auth';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { FormSheet, FormSheetActions } from '@/components/ui/form-sheet';
import { useToast } from '@/components/ui/toast';
import { useConstruction } from '../api/get-construction';
import type { LifecycleAnswer } from '../api/lifecycle-mutation';
import { useRecordProofTest, type ProofTestRequest } from '../api/record-proof-test';
import { useSubmissionKey } from '../hooks/use-submission-key';
import { ChoiceTiles } from './choice-tiles';
import { measurement, numberOrNull, requestResolver, requiredMeasurement, textOrNull, todayIso } from './form-values';
import { PROOF_TEST_MEDIUM_LABELS } from './labels';
import { MeasureField } from './measure-field';
import { applySubmissionError, ServerMessage } from './server-message';
import { TextAreaField } from './text-area-field';

interface ProofTestValues {
  testedOn: string;
  medium: ProofTestMedium;
  requiredPressure: string;
  heldPressure: string;
  holdSeconds: string;
  result: 'pass' | 'fail' | '';
  tester: string;
  note: string;
}

const FIELDS = ['testedOn', 'medium', 'requiredPressure', 'heldPressure', 'holdSeconds', 'result', 'tester', 'note'] as const;

/** What the proof-test form always says: liquid only, stand clear. */
export const HYDROSTATIC_ONLY =
  'Proof tests are hydrostatic: fill the assembly with water or another liquid and bleed out all the air first. Never pressure-test a hose with air or gas: the stored energy makes a failure violent. Stand clear of the hose and its ends while it is under test pressure.';

interface ProofTestSheetProps {
  assembly: AssemblyDto;
  open: boolean;
  onClose: () => void;
  onRecorded?: (answer: LifecycleAnswer) => void;
}

export function ProofTestSheet({ assembly, open, onClose, onRecorded }: ProofTestSheetProps) {
  return (
    <FormSheet open={open} onClose={onClose} title="Record a proof test" description={`Assembly ${formatTagCode(assembly.number)}, ${assembly.construction.code}`}>
      <ProofTestForm assembly={assembly} onClose={onClose} onRecorded={onRecorded} />
    </FormSheet>
  );
}

function ProofTestForm({ assembly, onClose, onRecorded }: Omit<ProofTestSheetProps, 'open'>) {
  const me = useCurrentUser();
  const unit = me.preferences.pressureUnit;
  const toast = useToast();
  const construction = useConstruction(assembly.construction.id);
  const burstKpa = construction.data?.burstPressureKpa ?? null;
  const defaultKpa = burstKpa != null ? defaultProofTestPressureKpa(burstKpa) : null;
  const submission = useSubmissionKey();

  const toRequest = (v: ProofTestValues): ProofTestRequest => ({
    testedOn: v.testedOn,
    medium: v.medium,
    requiredPressure: measurement(v.requiredPressure, unit),
    heldPressure: requiredMeasurement(v.heldPressure, unit) as ProofTestRequest['heldPressure'],
    holdSeconds: (numberOrNull(v.holdSeconds) ?? undefined) as number,
    result: (v.result || undefined) as 'pass' | 'fail',
    tester: v.tester,
    note: textOrNull(v.note),
  });

  const {
    register,
    handleSubmit,
    setError,
    watch,
    setValue,
    formState: { errors },
  } = useForm<ProofTestValues>({
    resolver: requestResolver(proofTestSchema, toRequest, { holdSeconds: 'Enter how long the pressure was held, in seconds', testedOn: 'Enter the test date' }),
    mode: 'onChange',
    defaultValues: { testedOn: todayIso(), medium: 'water', requiredPressure: '', heldPressure: '', holdSeconds: '', result: '', tester: me.name, note: '' },
  });

  const record = useRecordProofTest({
    onSuccess: (answer) => {
      const passed = answer.data.proofTest?.result === 'pass';
      toast.show({
        title: 'Proof test saved',
        description: answer.data.status === 'in_stock' && assembly.status === 'built' ? `${formatTagCode(answer.data.number)} is now in stock.` : passed ? 'Recorded as passed.' : 'Recorded as failed.',
      });
      onRecorded?.(answer);
      onClose();
    },
  });

  const onSubmit = handleSubmit((values) =>
    submission.once((idempotencyKey) =>
      record.mutateAsync(
        { assemblyId: assembly.id, input: toRequest(values), idempotencyKey },
        { onError: (error) => applySubmissionError(error, setError, FIELDS) },
      ),
    ),
  );

  const requiredKpa = (() => {
    const typed = numberOrNull(watch('requiredPressure'));
    return typed != null && Number.isFinite(typed) ? toKpa(typed, unit) : defaultKpa;
  })();
  const heldTyped = numberOrNull(watch('heldPressure'));
  const heldBelow = requiredKpa != null && heldTyped != null && Number.isFinite(heldTyped) && toKpa(heldTyped, unit) < requiredKpa * (1 - 1e-9);

  const requiredHint =
    defaultKpa != null ? (
      <>
        Leave empty to use the default, <strong className="text-ink-950">{formatPressure(defaultKpa, unit)}</strong>: half the burst pressure of{' '}
        {formatPressure(burstKpa, unit)} (RMA IP-2 proof test).
      </>
    ) : construction.isPending ? (
      'Working out the default from the construction’s burst pressure…'
    ) : (
      'The construction has no burst pressure recorded: enter the required test pressure.'
    );

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label="Proof test">
      <Alert tone="danger" title="Hydrostatic test only: never air or gas">
        {HYDROSTATIC_ONLY}
      </Alert>
      <ServerMessage error={errors.root?.server} assemblyId={assembly.id} onReload={onClose} />
      <TextField label="Test date" type="date" error={errors.testedOn?.message} data-autofocus {...register('testedOn')} />
      <ChoiceTiles
        legend="Test liquid"
        columns={3}
        options={PROOF_TEST_MEDIA.map((m) => ({ value: m, label: PROOF_TEST_MEDIUM_LABELS[m] }))}
        value={watch('medium')}
        onChange={(medium) => setValue('medium', medium, { shouldValidate: true })}
        error={errors.medium?.message}
      />
      <MeasureField
        label="Required test pressure"
        unit={unit}
        hint={requiredHint}
        error={errors.requiredPressure?.message}
        {...register('requiredPressure')}
      />
      <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
        <MeasureField label="Pressure held" unit={unit} error={errors.heldPressure?.message} {...register('heldPressure')} />
        <MeasureField label="Held for" unit="s" error={errors.holdSeconds?.message} {...register('holdSeconds')} />
      </div>
      {heldBelow ? <Alert tone="info">The pressure held is below the required pressure: the test does not pass at that pressure.</Alert> : null}
      <ChoiceTiles
        legend="Result"
        options={[
          { value: 'pass', label: 'Passed', description: 'Held the pressure with no leak, sweat or movement at the fittings.' },
          { value: 'fail', label: 'Failed', description: 'Leaked, burst, or a fitting moved.' },
        ]}
        value={watch('result') || null}
        onChange={(result) => setValue('result', result, { shouldValidate: true })}
        error={errors.result?.message}
      />
      <TextField label="Tested by" autoComplete="name" error={errors.tester?.message} {...register('tester')} />
      <TextAreaField label="Note (optional)" error={errors.note?.message} {...register('note')} />
      <FormSheetActions>
        <Button variant="secondary" onClick={onClose}>
          Cancel
        </Button>
        <Button type="submit" size="lg" loading={record.isPending}>
          Save proof test
        </Button>
      </FormSheetActions>
    </form>
  );
}
