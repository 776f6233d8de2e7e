import { useEffect, useState } from 'react';
import { useForm } from 'react-hook-form';
import { assemblyBuildSchema } from '@shared/schemas/assemblies.schema';
import type { SiteSummary } from '@shared/schemas/auth.schema';
import type { ConstructionDto } from '@shared/schemas/register.schema';
import { formatLength, toMm } from '@shared/units/units';
import { useCurrentUser } from '@/lib/auth';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Card, CardBody, CardHeader } from '@/components/ui/card';
import { Checkbox } from '@/components/ui/checkbox';
import { ErrorState } from '@/components/ui/error-state';
import { SelectField, TextField } from '@/components/ui/field';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useBuildAssembly } from '../../api/build-assembly';
import { useConstruction } from '../../api/get-construction';
import { useFittingTypes } from '../../api/get-fitting-types';
import { useSite } from '../../api/get-site';
import type { LifecycleAnswer } from '../../api/lifecycle-mutation';
import { useSubmissionKey } from '../../hooks/use-submission-key';
import { numberOrNull, requestResolver, todayIso } from '../form-values';
import { MeasureField } from '../measure-field';
import { applySubmissionError, ServerMessage } from '../server-message';
import { TextAreaField } from '../text-area-field';
import { BUILD_FIELDS, buildRequest, type BuildValues } from './build-values';
import { ConstructionPicker } from './construction-picker';
import { FittingEndFields } from './fitting-end-fields';

interface AssemblyBuildFormProps {
  sites: SiteSummary[];
  defaultSiteId?: string;
  defaultConstructionId?: string;
  onBuilt: (answer: LifecycleAnswer) => void;
  onCancel: () => void;
}

/** A newly built assembly: its hose, lengths, fittings and crimps, and who built it when. */
export function AssemblyBuildForm({ sites, defaultSiteId, defaultConstructionId, onBuilt, onCancel }: AssemblyBuildFormProps) {
  const me = useCurrentUser();
  const units = me.preferences;
  const submission = useSubmissionKey();
  const [construction, setConstruction] = useState<ConstructionDto | null>(null);
  const preset = useConstruction(defaultConstructionId);
  const fittings = useFittingTypes();

  const startSite = sites.find((s) => s.id === defaultSiteId)?.id ?? (sites.length === 1 ? sites[0]!.id : '');
  const {
    register,
    handleSubmit,
    setError,
    setValue,
    watch,
    formState: { errors },
  } = useForm<BuildValues>({
    resolver: requestResolver(assemblyBuildSchema, (v: BuildValues) => buildRequest(v, units.lengthUnit), {
      constructionId: 'Choose the construction',
      siteId: 'Choose the site whose store it goes into',
      builtOn: 'Enter the build date',
      overallLength: 'Enter the overall length',
    }),
    mode: 'onChange',
    defaultValues: {
      constructionId: '',
      siteId: startSite,
      storeLocation: '',
      hoseBatch: '',
      hoseManufacturedOn: '',
      overallLength: '',
      cutLength: '',
      endA: { fittingTypeId: '', crimpDiameter: '' },
      endB: { fittingTypeId: '', crimpDiameter: '' },
      builtOn: todayIso(),
      builtOnEstimated: false,
      builder: me.name,
      cost: '',
      note: '',
    },
  });

  useEffect(() => {
    if (preset.data && !preset.data.archivedAt && !construction && !watch('constructionId')) {
      setConstruction(preset.data);
      setValue('constructionId', preset.data.id);
    }
  }, [preset.data, construction, setValue, watch]);

  const site = useSite(watch('siteId') || undefined);
  const overall = numberOrNull(watch('overallLength'));
  const shortWarning =
    overall != null && Number.isFinite(overall) && overall > 0 && toMm(overall, units.lengthUnit) < 150 ? (
      <span className="font-semibold text-danger-800">
        That is {formatLength(toMm(overall, units.lengthUnit), units.lengthUnit)} end to end: check it is in {units.lengthUnit}.
      </span>
    ) : undefined;
  const build = useBuildAssembly({ onSuccess: (answer) => onBuilt(answer) });
  const onSubmit = handleSubmit((values) =>
    submission.once((idempotencyKey) =>
      build.mutateAsync({ input: buildRequest(values, units.lengthUnit), idempotencyKey }, { onError: (error) => applySubmissionError(error, setError, BUILD_FIELDS) }),
    ),
  );

  const chooseConstruction = (c: ConstructionDto | null) => {
    setConstruction(c);
    setValue('constructionId', c?.id ?? '', { shouldValidate: Boolean(c) });
  };

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label="Build an assembly">
      <ServerMessage error={errors.root?.server} />
      <Card>
        <CardHeader title="Hose" />
        <CardBody className="flex flex-col gap-4">
          <ConstructionPicker value={construction} onChange={chooseConstruction} units={units} error={errors.constructionId?.message} />
          <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
            <TextField label="Hose batch (optional)" hint="As printed on the layline." autoComplete="off" error={errors.hoseBatch?.message} {...register('hoseBatch')} />
            <TextField label="Hose manufacture date (optional)" type="date" error={errors.hoseManufacturedOn?.message} {...register('hoseManufacturedOn')} />
            <MeasureField
              label="Overall length"
              unit={units.lengthUnit}
              hint={shortWarning ?? 'End to end, fittings included.'}
              error={errors.overallLength?.message}
              {...register('overallLength')}
            />
            <MeasureField label="Cut length (optional)" unit={units.lengthUnit} hint="The hose as cut, before fittings." error={errors.cutLength?.message} {...register('cutLength')} />
          </div>
        </CardBody>
      </Card>

      <Card>
        <CardHeader title="Fittings" description="Measure each crimp after crimping; the specification is the fitting type’s at the hose’s size." />
        <CardBody className="flex flex-col gap-4">
          {fittings.isPending ? (
            <SkeletonBlock label="Loading fitting types…" lines={2} />
          ) : fittings.isError ? (
            <ErrorState title="The fitting types could not be loaded" error={fittings.error} onRetry={() => void fittings.refetch()} retrying={fittings.isFetching} />
          ) : (
            <div className="grid grid-cols-1 gap-4 lg:grid-cols-2">
              {fittings.data.data.length === 0 ? (
                <Alert tone="info" className="lg:col-span-2">
                  The catalogue has no fitting types yet. The assembly can be recorded without its fittings; its allowable pressure stays unknown until they are.
                </Alert>
              ) : null}
              {(['endA', 'endB'] as const).map((end) => (
                <FittingEndFields
                  key={end}
                  end={end}
                  label={end === 'endA' ? 'End A' : 'End B'}
                  fittings={fittings.data.data}
                  fittingTypeId={watch(`${end}.fittingTypeId`)}
                  crimpText={watch(`${end}.crimpDiameter`)}
                  sizeCode={construction?.sizeCode ?? null}
                  units={units}
                  register={register}
                  errors={errors}
                />
              ))}
            </div>
          )}
        </CardBody>
      </Card>

      <Card>
        <CardHeader title="Build and store" />
        <CardBody className="flex flex-col gap-4">
          <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
            <div className="flex flex-col gap-1">
              <TextField label="Build date" type="date" error={errors.builtOn?.message} {...register('builtOn')} />
              <Checkbox label="The date is an estimate" {...register('builtOnEstimated')} />
            </div>
            <TextField label="Built by (optional)" autoComplete="off" error={errors.builder?.message} {...register('builder')} />
            <SelectField
              label="Stock site"
              placeholder={sites.length === 1 ? undefined : 'Choose the site'}
              options={sites.map((s) => ({ value: s.id, label: s.name }))}
              error={errors.siteId?.message}
              {...register('siteId')}
            />
            <TextField label="Store location (optional)" hint="Rack, bin or shelf." autoComplete="off" error={errors.storeLocation?.message} {...register('storeLocation')} />
            <MeasureField label="Cost (optional)" unit={site.data?.currency ?? 'cost'} error={errors.cost?.message} {...register('cost')} />
          </div>
          <TextAreaField label="Note (optional)" error={errors.note?.message} {...register('note')} />
        </CardBody>
      </Card>

      <div className="flex flex-col-reverse gap-3 sm:flex-row sm:justify-end">
        <Button variant="secondary" size="lg" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" size="lg" loading={build.isPending}>
          Build and tag it
        </Button>
      </div>
    </form>
  );
}
