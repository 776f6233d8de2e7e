import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { installSchema, type AssemblyDto, type OverrideInput } from '@shared/schemas/assemblies.schema';
import type { PositionDto } from '@shared/schemas/register.schema';
import { formatTagCode } from '@shared/tags/tag-code';
import { hasAbility, useCurrentUser } from '@/lib/auth';
import { Button } from '@/components/ui/button';
import { FormSheet, FormSheetActions } from '@/components/ui/form-sheet';
import { useToast } from '@/components/ui/toast';
import { useInstallAssembly, type InstallRequest } from '../api/install-assembly';
import { useSubmissionKey } from '../hooks/use-submission-key';
import { ChecksRefusal, checksRefusalOf } from './checks-refusal';
import { EVENT_FIELD_DEFAULTS, EVENT_FIELD_NAMES, EventFields, eventRequestFields, type EventFieldValues } from './event-fields';
import { requestResolver } from './form-values';
import { PositionPicker } from './position-picker';
import { PreviewChecks } from './preview-checks';
import { applySubmissionError, ServerMessage } from './server-message';

interface InstallValues extends EventFieldValues {
  positionId: string;
}

const FIELDS = ['positionId', ...EVENT_FIELD_NAMES] as const;

const toRequest = (v: InstallValues): InstallRequest => ({ ...eventRequestFields(v), positionId: v.positionId });

interface SheetProps {
  assembly: AssemblyDto;
  open: boolean;
  onClose: () => void;
}

export function InstallSheet({ open, onClose, assembly }: SheetProps) {
  return (
    <FormSheet open={open} onClose={onClose} size="lg" title="Install" description={`Assembly ${formatTagCode(assembly.number)}, ${assembly.construction.code}, from stock into an empty position.`}>
      <InstallForm assembly={assembly} onClose={onClose} />
    </FormSheet>
  );
}

function InstallForm({ assembly, onClose }: Omit<SheetProps, 'open'>) {
  const me = useCurrentUser();
  const toast = useToast();
  const submission = useSubmissionKey();
  const [position, setPosition] = useState<PositionDto | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    setValue,
    formState: { errors },
  } = useForm<InstallValues>({
    resolver: requestResolver(installSchema, toRequest, { positionId: 'Choose the position it goes into' }),
    mode: 'onChange',
    defaultValues: { ...EVENT_FIELD_DEFAULTS, positionId: '' },
  });
  const install = useInstallAssembly({
    onSuccess: (answer) => {
      toast.show({ title: 'Installed', description: `${formatTagCode(answer.data.number)} is installed at ${answer.data.position?.code ?? 'the position'}.` });
      onClose();
    },
  });
  const refusal = checksRefusalOf(install.error);

  const send = (values: InstallValues, override?: OverrideInput) =>
    submission.once((idempotencyKey) =>
      install.mutateAsync(
        { assemblyId: assembly.id, input: { ...toRequest(values), ...(override ? { override } : {}) }, idempotencyKey },
        { onError: (error) => (checksRefusalOf(error) ? undefined : applySubmissionError(error, setError, FIELDS)) },
      ),
    );
  const onSubmit = handleSubmit((values) => send(values));

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label="Install">
      <ServerMessage error={errors.root?.server} assemblyId={assembly.id} onReload={onClose} />
      <PositionPicker
        sites={me.sites.length ? me.sites : [{ id: assembly.siteId, code: '', name: assembly.siteName }]}
        defaultSiteId={assembly.siteId}
        value={position?.id ?? null}
        onChange={(p) => {
          setPosition(p);
          install.reset();
          setValue('positionId', p.id, { shouldValidate: true });
        }}
        units={me.preferences}
        error={errors.positionId?.message}
      />
      {position ? <PreviewChecks assembly={assembly} positionId={position.id} /> : null}
      <EventFields register={register} errors={errors} />
      {refusal ? (
        <ChecksRefusal
          refusal={refusal}
          message={install.error?.message ?? ''}
          canOverride={hasAbility(me, 'checks.override')}
          overriding={install.isPending}
          overrideLabel="Install with override"
          onOverride={(override) => void handleSubmit((values) => send(values, override))()}
        />
      ) : null}
      <FormSheetActions>
        <Button variant="secondary" onClick={onClose}>
          Cancel
        </Button>
        {refusal ? null : (
          <Button type="submit" size="lg" loading={install.isPending}>
            Install
          </Button>
        )}
      </FormSheetActions>
    </form>
  );
}
