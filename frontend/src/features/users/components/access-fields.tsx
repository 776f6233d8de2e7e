import { Controller, useFormContext, useWatch } from 'react-hook-form';
import type { SiteSummary } from '@shared/schemas/auth.schema';
import { Checkbox } from '@/components/ui/checkbox';
import { TextField } from '@/components/ui/field';
import type { RenderSitePicker } from './site-picker-slot';

/** The fields both user forms share. */
export interface AccessFormShape {
  allSites: boolean;
  siteIds: string[];
  accessExpiresOn: string | null;
}

interface AccessFieldsProps {
  renderSitePicker: RenderSitePicker;
  /** Only an administrator who sees every site may hand out "all sites". */
  canGrantAllSites: boolean;
  extraSites?: SiteSummary[];
}

/** Which sites a user sees, and until when. Lives inside a FormProvider. */
export function AccessFields({ renderSitePicker, canGrantAllSites, extraSites }: AccessFieldsProps) {
  const {
    register,
    control,
    formState: { errors },
  } = useFormContext<AccessFormShape>();
  const allSites = useWatch({ control, name: 'allSites' });

  return (
    <div className="flex flex-col gap-5">
      {canGrantAllSites || allSites ? (
        <Checkbox
          label="All sites, including future ones"
          hint="The user sees every site now in Ferrule and every site added later."
          error={errors.allSites?.message}
          {...register('allSites')}
        />
      ) : (
        <p className="text-sm text-ink-700">You can give access only to sites you have access to yourself.</p>
      )}
      {!allSites ? (
        <Controller
          control={control}
          name="siteIds"
          render={({ field, fieldState }) => (
            <>{renderSitePicker({ value: field.value ?? [], onChange: field.onChange, error: fieldState.error?.message, extraSites })}</>
          )}
        />
      ) : null}
      <TextField
        type="date"
        label="Access expires on"
        hint="Optional, for contractors and auditors. Leave empty for access without an end date."
        error={errors.accessExpiresOn?.message}
        className="sm:max-w-64"
        {...register('accessExpiresOn', { setValueAs: (value: unknown) => (value === '' || value === undefined ? null : value) })}
      />
    </div>
  );
}
