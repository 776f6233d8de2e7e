import { FormProvider, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { userUpdateSchema, type UserDto, type UserUpdateInput } from '@shared/schemas/users.schema';
import { applyServerError } from '@/lib/form-errors';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { useToast } from '@/components/ui/toast';
import { useUpdateUser } from '../api/update-user';
import { AccessFields } from './access-fields';
import type { RenderSitePicker } from './site-picker-slot';
import { ROLE_OPTIONS } from './user-labels';

const FIELDS = ['name', 'role', 'allSites', 'siteIds', 'accessExpiresOn'] as const;

const valuesOf = (user: UserDto) => ({
  name: user.name,
  role: user.role,
  allSites: user.allSites,
  siteIds: user.sites.map((s) => s.id),
  accessExpiresOn: user.accessExpiresOn,
});

interface UserEditFormProps {
  user: UserDto;
  renderSitePicker: RenderSitePicker;
  canGrantAllSites: boolean;
  onSaved?: (user: UserDto) => void;
}

/** Name, role, sites and access expiry of one user. Only what was changed is sent. */
export function UserEditForm({ user, renderSitePicker, canGrantAllSites, onSaved }: UserEditFormProps) {
  const toast = useToast();
  const form = useForm({ resolver: zodResolver(userUpdateSchema), mode: 'onTouched', defaultValues: valuesOf(user) });
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, dirtyFields, isDirty },
  } = form;
  const update = useUpdateUser({
    onSuccess: (saved) => {
      reset(valuesOf(saved));
      toast.show({ title: 'Changes saved', description: `${saved.name}'s account is up to date.` });
      onSaved?.(saved);
    },
  });
  const readOnly = !user.abilities.update;

  const onSubmit = handleSubmit((values) => {
    const input: UserUpdateInput = {};
    if (dirtyFields.name) input.name = values.name;
    if (dirtyFields.role) input.role = values.role;
    if (dirtyFields.allSites || dirtyFields.siteIds) {
      input.allSites = values.allSites;
      input.siteIds = values.allSites ? [] : values.siteIds;
    }
    if (dirtyFields.accessExpiresOn) input.accessExpiresOn = values.accessExpiresOn ?? null;
    update.mutate({ id: user.id, input }, { onError: (error) => applyServerError(error, setError, FIELDS) });
  });

  return (
    <FormProvider {...form}>
      <form onSubmit={onSubmit} noValidate aria-label="User details">
        <fieldset disabled={readOnly} className="flex flex-col gap-5">
          {readOnly ? <Alert>You can see this user's details but not change them.</Alert> : null}
          {errors.root?.server ? <Alert tone="danger">{errors.root.server.message}</Alert> : null}
          <TextField label="Name" autoComplete="off" error={errors.name?.message} {...register('name')} />
          <SelectField label="Role" options={ROLE_OPTIONS} error={errors.role?.message} {...register('role')} />
          <AccessFields renderSitePicker={renderSitePicker} canGrantAllSites={canGrantAllSites} extraSites={user.sites} />
          {readOnly ? null : (
            <div className="flex flex-wrap items-center gap-3">
              <Button type="submit" loading={update.isPending} disabled={!isDirty}>
                Save changes
              </Button>
              {isDirty ? (
                <Button variant="ghost" onClick={() => reset(valuesOf(user))}>
                  Undo changes
                </Button>
              ) : null}
            </div>
          )}
        </fieldset>
      </form>
    </FormProvider>
  );
}
