import { useEffect, useRef } from 'react';
import { useForm } from 'react-hook-form';
import type { CheckResult, SelectionCheckCode } from '@shared/checks/types';
import { overrideInputSchema, type OverrideInput } from '@shared/schemas/assemblies.schema';
import { isApiError } from '@/lib/api-client';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Checkbox } from '@/components/ui/checkbox';
import { FieldError, TextField } from '@/components/ui/field';
import { CheckResultList } from './check-results';
import { daysFromToday, requestResolver } from './form-values';
import { checkLabel } from './labels';
import { TextAreaField } from './text-area-field';

/** What a refused install carries: every check result, and whether the fails may be overridden. */
export interface ChecksRefusalDetails {
  results: CheckResult[];
  overridable: boolean;
}

/** The details of a 409 `checks_failed`, or null for any other error. */
export function checksRefusalOf(error: unknown): ChecksRefusalDetails | null {
  if (!isApiError(error) || error.code !== 'checks_failed') return null;
  const details = error.details as Partial<ChecksRefusalDetails> | undefined;
  return { results: Array.isArray(details?.results) ? details.results : [], overridable: details?.overridable === true };
}

interface ChecksRefusalProps {
  refusal: ChecksRefusalDetails;
  /** The server's sentence, shown when it names something the results do not. */
  message: string;
  /** Whether this user may accept failed checks (from the assembly's abilities). */
  canOverride: boolean;
  onOverride: (override: OverrideInput) => void;
  overriding?: boolean;
  /** The words of the button that sends the override, e.g. "Install with override". */
  overrideLabel: string;
}

/**
 * Why the checks refused: each failing check's sentence; then, when every fail may be accepted
 * and the user may accept it, the override (which checks, why, when to review); otherwise the
 * plain way past.
 */
export function ChecksRefusal({ refusal, message, canOverride, onOverride, overriding, overrideLabel }: ChecksRefusalProps) {
  const fails = refusal.results.filter((r) => r.outcome === 'fail');
  const box = useRef<HTMLDivElement>(null);
  // The refusal arrives below the form: bring it, and the way past it, into view.
  useEffect(() => {
    box.current?.scrollIntoView?.({ block: 'start', behavior: 'smooth' });
  }, [refusal]);
  return (
    <div ref={box} className="flex flex-col gap-4" data-testid="checks-refusal">
      <Alert tone="danger" title={`The selection checks refused it: ${fails.length === 1 ? 'one check fails' : `${fails.length} checks fail`}`}>
        {fails.length ? <CheckResultList results={fails} showSources={false} className="mt-2" /> : <p>{message}</p>}
      </Alert>
      {!refusal.overridable ? (
        <Alert tone="info" title="This cannot be overridden">
          A failed allowable-pressure or proof-test check has no override. The only way past is a change of the position’s design conditions
          (made by a reliability engineer, and audited) or a new proof test that passes. Choose another assembly, or leave the one in place tagged out.
        </Alert>
      ) : canOverride ? (
        <OverrideForm fails={fails} onOverride={onOverride} overriding={overriding} submitLabel={overrideLabel} />
      ) : (
        <Alert tone="info" title="A reliability engineer or administrator can accept this">
          These checks may be accepted with a reason and a review date, but not by your role. Ask a reliability engineer, or choose another assembly.
        </Alert>
      )}
    </div>
  );
}

interface OverrideFormValues {
  checks: SelectionCheckCode[];
  reason: string;
  reviewOn: string;
}

const toOverride = (values: OverrideFormValues) => ({ checks: values.checks, reason: values.reason, reviewOn: values.reviewOn });

function OverrideForm({ fails, onOverride, overriding, submitLabel }: { fails: CheckResult[]; onOverride: (o: OverrideInput) => void; overriding?: boolean; submitLabel: string }) {
  const {
    register,
    handleSubmit,
    watch,
    setValue,
    formState: { errors },
  } = useForm<OverrideFormValues>({
    resolver: requestResolver(overrideInputSchema, toOverride),
    mode: 'onChange',
    defaultValues: { checks: fails.map((f) => f.check), reason: '', reviewOn: daysFromToday(30) },
  });
  const submit = handleSubmit((values) => onOverride(overrideInputSchema.parse(toOverride(values))));
  const chosen = watch('checks');
  const toggle = (code: SelectionCheckCode, on: boolean) =>
    setValue('checks', on ? [...chosen.filter((c) => c !== code), code] : chosen.filter((c) => c !== code), { shouldValidate: true });
  return (
    <div role="group" aria-label="Override the failed checks" className="flex flex-col gap-4 rounded-[var(--radius-control)] border-2 border-copper-700 bg-copper-50 px-4 py-4">
      <div>
        <h3 className="text-lg font-bold text-ink-950">Accept the failed checks</h3>
        <p className="text-ink-800">You take responsibility for this assembly at this position until the review date. The override and your reason are shown on the assembly for everyone.</p>
      </div>
      <fieldset className="flex flex-col gap-1" aria-describedby={errors.checks ? 'override-checks-error' : undefined}>
        <legend className="mb-1 font-semibold text-ink-900">Checks you accept</legend>
        {fails.map((f) => (
          <Checkbox key={f.check} label={checkLabel(f.check)} checked={chosen.includes(f.check)} onChange={(event) => toggle(f.check, event.target.checked)} />
        ))}
        <FieldError id="override-checks-error" message={errors.checks?.message} />
      </fieldset>
      <TextAreaField label="Why it is acceptable" hint="At least 10 characters: what makes it safe, and what will change." error={errors.reason?.message} {...register('reason')} />
      <TextField label="Review by" type="date" error={errors.reviewOn?.message} {...register('reviewOn')} />
      <Button type="button" size="lg" loading={overriding} onClick={() => void submit()}>
        {submitLabel}
      </Button>
    </div>
  );
}
