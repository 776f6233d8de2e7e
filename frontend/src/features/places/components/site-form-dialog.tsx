import { useMemo } from 'react';
import { useForm, type UseFormReturn } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { siteCreateSchema, siteUpdateSchema, type SiteCreateInput, type SiteDto, type SiteUpdateInput } from '@shared/schemas/register.schema';
import { LENGTH_UNIT_SYMBOLS, LENGTH_UNITS, PRESSURE_UNIT_SYMBOLS, PRESSURE_UNITS, TEMPERATURE_UNIT_SYMBOLS, TEMPERATURE_UNITS } from '@shared/units/units';
import { applyServerError } from '@/lib/form-errors';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { SelectField, TextField } from '@/components/ui/field';
import { useCreateSite } from '../api/create-site';
import { useUpdateSite } from '../api/update-site';

const PRESSURE_OPTIONS = PRESSURE_UNITS.map((u) => ({ value: u, label: PRESSURE_UNIT_SYMBOLS[u] }));
const LENGTH_OPTIONS = LENGTH_UNITS.map((u) => ({ value: u, label: LENGTH_UNIT_SYMBOLS[u] }));
const TEMPERATURE_OPTIONS = TEMPERATURE_UNITS.map((u) => ({ value: u, label: TEMPERATURE_UNIT_SYMBOLS[u] }));
const FIELDS = ['code', 'name', 'timeZone', 'currency', 'defaultUnits'] as const;

/** The time zones this browser knows, for the picker's suggestions. */
function timeZones(): string[] {
  try {
    return Intl.supportedValuesOf('timeZone');
  } catch {
    return [];
  }
}

function localTimeZone(): string {
  try {
    return Intl.DateTimeFormat().resolvedOptions().timeZone;
  } catch {
    return 'UTC';
  }
}

interface SiteFormDialogProps {
  open: boolean;
  onClose: () => void;
  /** The site to change; none to add one. */
  site?: SiteDto;
  onSaved: (site: SiteDto) => void;
}

export function SiteFormDialog({ open, onClose, site, onSaved }: SiteFormDialogProps) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      size="md"
      title={site ? `Edit ${site.name}` : 'New site'}
      description={site ? undefined : 'A mine, quarry or plant. It starts with every service of the catalogue at its defaults.'}
    >
      {site ? <EditSiteForm site={site} onSaved={onSaved} onCancel={onClose} /> : <NewSiteForm onSaved={onSaved} onCancel={onClose} />}
    </Dialog>
  );
}

type SiteFormValues = SiteCreateInput;

function SiteFields({ form, withCode }: { form: UseFormReturn<SiteFormValues>; withCode: boolean }) {
  const {
    register,
    formState: { errors },
  } = form;
  const zones = useMemo(timeZones, []);
  const unitErrors = errors.defaultUnits;
  return (
    <>
      {errors.root?.server ? <Alert tone="danger">{errors.root.server.message}</Alert> : null}
      {withCode ? (
        <TextField
          label="Site code"
          hint="Short and for good, such as NPIT. Letters, digits, dots, dashes, underscores and slashes only."
          autoComplete="off"
          autoCapitalize="characters"
          spellCheck={false}
          error={errors.code?.message}
          data-autofocus
          {...register('code')}
        />
      ) : null}
      <TextField label="Site name" autoComplete="off" error={errors.name?.message} {...register('name')} />
      <div className="grid grid-cols-1 gap-4 sm:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <TextField
          label="Time zone"
          hint="Dates of events are shown in it, such as Europe/London."
          list="ferrule-time-zones"
          autoComplete="off"
          spellCheck={false}
          error={errors.timeZone?.message}
          {...register('timeZone')}
        />
        <TextField
          label="Currency"
          hint="Three letters, such as GBP."
          autoComplete="off"
          autoCapitalize="characters"
          maxLength={3}
          spellCheck={false}
          error={errors.currency?.message}
          {...register('currency', { setValueAs: (v: string) => v.toUpperCase() })}
        />
      </div>
      <datalist id="ferrule-time-zones">
        {zones.map((zone) => (
          <option key={zone} value={zone} />
        ))}
      </datalist>
      <fieldset className="flex flex-col gap-3">
        <legend className="mb-1 font-semibold text-ink-900">Default units</legend>
        <p className="-mt-1 text-sm text-ink-600">For people new to the site; each person can choose their own units.</p>
        <div className="grid grid-cols-1 gap-3 sm:grid-cols-3">
          <SelectField label="Pressure" options={PRESSURE_OPTIONS} error={unitErrors?.pressureUnit?.message} {...register('defaultUnits.pressureUnit')} />
          <SelectField label="Length" options={LENGTH_OPTIONS} error={unitErrors?.lengthUnit?.message} {...register('defaultUnits.lengthUnit')} />
          <SelectField label="Temperature" options={TEMPERATURE_OPTIONS} error={unitErrors?.temperatureUnit?.message} {...register('defaultUnits.temperatureUnit')} />
        </div>
      </fieldset>
    </>
  );
}

function NewSiteForm({ onSaved, onCancel }: { onSaved: (site: SiteDto) => void; onCancel: () => void }) {
  const form = useForm<SiteFormValues>({
    resolver: zodResolver(siteCreateSchema),
    mode: 'onChange',
    defaultValues: { code: '', name: '', timeZone: localTimeZone(), currency: '', defaultUnits: { pressureUnit: 'bar', lengthUnit: 'mm', temperatureUnit: 'C' } },
  });
  const create = useCreateSite({ onSuccess: onSaved });
  const onSubmit = form.handleSubmit((values) => create.mutate(values, { onError: (error) => applyServerError(error, form.setError, FIELDS) }));
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label="New site">
      <SiteFields form={form} withCode />
      <DialogActions>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" loading={create.isPending}>
          Add site
        </Button>
      </DialogActions>
    </form>
  );
}

function EditSiteForm({ site, onSaved, onCancel }: { site: SiteDto; onSaved: (site: SiteDto) => void; onCancel: () => void }) {
  const form = useForm<SiteFormValues>({
    // The code is shown, not sent: it never changes.
    resolver: zodResolver(siteCreateSchema),
    mode: 'onChange',
    defaultValues: { code: site.code, name: site.name, timeZone: site.timeZone, currency: site.currency, defaultUnits: { ...site.defaultUnits } },
  });
  const update = useUpdateSite({ onSuccess: onSaved });
  const { dirtyFields, isDirty } = form.formState;
  const onSubmit = form.handleSubmit((values) => {
    const input: SiteUpdateInput = {};
    if (dirtyFields.name) input.name = values.name;
    if (dirtyFields.timeZone) input.timeZone = values.timeZone;
    if (dirtyFields.currency) input.currency = values.currency;
    if (dirtyFields.defaultUnits) input.defaultUnits = values.defaultUnits;
    update.mutate({ id: site.id, input: siteUpdateSchema.parse(input) }, { onError: (error) => applyServerError(error, form.setError, FIELDS) });
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label={`Edit ${site.name}`}>
      <div className="flex flex-col gap-1">
        <span className="font-semibold text-ink-900">Site code</span>
        <span className="font-mono text-lg text-ink-950">{site.code}</span>
      </div>
      <SiteFields form={form} withCode={false} />
      <DialogActions>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" loading={update.isPending} disabled={!isDirty}>
          Save changes
        </Button>
      </DialogActions>
    </form>
  );
}
