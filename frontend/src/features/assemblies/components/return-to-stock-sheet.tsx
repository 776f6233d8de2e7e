import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { returnToStockSchema, type AssemblyDto } from '@shared/schemas/assemblies.schema';
import { formatTagCode } from '@shared/tags/tag-code';
import { isApiError } from '@/lib/api-client';
import { useCurrentUser } from '@/lib/auth';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { FormSheet, FormSheetActions } from '@/components/ui/form-sheet';
import { useToast } from '@/components/ui/toast';
import { useReturnToStock, type ReturnToStockRequest } from '../api/return-to-stock';
import { useSubmissionKey } from '../hooks/use-submission-key';
import { requestResolver, textOrNull } from './form-values';
import { applySubmissionError, ServerMessage } from './server-message';
import { TextAreaField } from './text-area-field';

interface ReturnValues {
  siteId: string;
  storeLocation: string;
  inspectionNote: string;
}

const FIELDS = ['siteId', 'storeLocation', 'inspectionNote'] as const;

const toRequest = (v: ReturnValues): ReturnToStockRequest => ({ siteId: v.siteId, storeLocation: textOrNull(v.storeLocation), inspectionNote: v.inspectionNote });

interface SheetProps {
  assembly: AssemblyDto;
  open: boolean;
  onClose: () => void;
  /** Opens the proof-test form, when the server asks for a re-test first. */
  onProofTest?: () => void;
}

export function ReturnToStockSheet({ open, onClose, ...props }: SheetProps) {
  return (
    <FormSheet open={open} onClose={onClose} title="Back into stock" description={`Assembly ${formatTagCode(props.assembly.number)}, after inspection and re-test.`}>
      <ReturnForm {...props} onClose={onClose} />
    </FormSheet>
  );
}

function ReturnForm({ assembly, onClose, onProofTest }: Omit<SheetProps, 'open'>) {
  const me = useCurrentUser();
  const toast = useToast();
  const submission = useSubmissionKey();
  const [retest, setRetest] = useState(false);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<ReturnValues>({
    resolver: requestResolver(returnToStockSchema, toRequest),
    mode: 'onChange',
    defaultValues: { siteId: assembly.siteId, storeLocation: assembly.storeLocation ?? '', inspectionNote: '' },
  });
  const back = useReturnToStock({
    onSuccess: (answer) => {
      toast.show({ title: 'Back in stock', description: `${formatTagCode(answer.data.number)} is in stock at ${answer.data.siteName}.` });
      onClose();
    },
  });
  const onSubmit = handleSubmit((values) =>
    submission.once((idempotencyKey) =>
      back.mutateAsync(
        { assemblyId: assembly.id, input: toRequest(values), idempotencyKey },
        {
          onError: (error) => {
            if (isApiError(error) && error.code === 'retest_required') {
              setRetest(true);
              return;
            }
            applySubmissionError(error, setError, FIELDS);
          },
        },
      ),
    ),
  );
  const sites = me.sites.some((s) => s.id === assembly.siteId) ? me.sites : [{ id: assembly.siteId, code: '', name: assembly.siteName }, ...me.sites];
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label="Back into stock">
      <Alert tone="info">A removed assembly goes back into stock only after an inspection and a proof test passed since it came out.</Alert>
      {retest ? (
        <Alert tone="danger" title="Re-test it first">
          <p>Record a passed proof test made since the removal before it goes back into stock.</p>
          {onProofTest ? (
            <Button className="mt-2" onClick={onProofTest}>
              Record a proof test
            </Button>
          ) : null}
        </Alert>
      ) : null}
      <ServerMessage error={errors.root?.server} assemblyId={assembly.id} onReload={onClose} />
      <TextAreaField label="What the inspection found" hint="Cover, reinforcement, fittings and crimps, tube if visible." error={errors.inspectionNote?.message} data-autofocus {...register('inspectionNote')} />
      {sites.length > 1 ? (
        <SelectField label="Store at site" options={sites.map((s) => ({ value: s.id, label: s.name }))} error={errors.siteId?.message} {...register('siteId')} />
      ) : null}
      <TextField label="Store location (optional)" hint="Rack, bin or shelf." autoComplete="off" error={errors.storeLocation?.message} {...register('storeLocation')} />
      <FormSheetActions>
        <Button variant="secondary" onClick={onClose}>
          Cancel
        </Button>
        <Button type="submit" size="lg" loading={back.isPending}>
          Put back into stock
        </Button>
      </FormSheetActions>
    </form>
  );
}
