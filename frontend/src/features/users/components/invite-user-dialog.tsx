import { FormProvider, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { userInviteSchema, type UserDto } from '@shared/schemas/users.schema';
import { applyServerError } from '@/lib/form-errors';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { SelectField, TextField } from '@/components/ui/field';
import { useToast } from '@/components/ui/toast';
import { useInviteUser } from '../api/invite-user';
import { AccessFields } from './access-fields';
import type { RenderSitePicker } from './site-picker-slot';
import { ROLE_OPTIONS } from './user-labels';

interface InviteUserDialogProps {
  open: boolean;
  onClose: () => void;
  renderSitePicker: RenderSitePicker;
  canGrantAllSites: boolean;
  onInvited?: (user: UserDto) => void;
}

export function InviteUserDialog({ open, onClose, ...formProps }: InviteUserDialogProps) {
  return (
    <Dialog open={open} onClose={onClose} title="Invite user" description="They get an e-mail with a link to choose a password." size="lg">
      <InviteUserForm onClose={onClose} {...formProps} />
    </Dialog>
  );
}

const FIELDS = ['email', 'name', 'role', 'allSites', 'siteIds', 'accessExpiresOn'] as const;

function InviteUserForm({ onClose, renderSitePicker, canGrantAllSites, onInvited }: Omit<InviteUserDialogProps, 'open'>) {
  const toast = useToast();
  const form = useForm({
    resolver: zodResolver(userInviteSchema),
    mode: 'onTouched',
    defaultValues: { email: '', name: '', role: undefined, allSites: false, siteIds: [], accessExpiresOn: null },
  });
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = form;
  const invite = useInviteUser({
    onSuccess: (user) => {
      toast.show({ title: `Invitation sent to ${user.email}` });
      onInvited?.(user);
      onClose();
    },
  });

  const onSubmit = handleSubmit((values) =>
    invite.mutate(
      { ...values, siteIds: values.allSites ? [] : values.siteIds },
      { onError: (error) => applyServerError(error, setError, FIELDS) },
    ),
  );

  return (
    <FormProvider {...form}>
      <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label="Invite user">
        {errors.root?.server ? <Alert tone="danger">{errors.root.server.message}</Alert> : null}
        <TextField
          label="E-mail"
          type="email"
          autoComplete="off"
          inputMode="email"
          autoCapitalize="off"
          spellCheck={false}
          error={errors.email?.message}
          data-autofocus
          {...register('email')}
        />
        <TextField label="Name" autoComplete="off" error={errors.name?.message} {...register('name')} />
        <SelectField label="Role" placeholder="Choose a role" options={ROLE_OPTIONS} error={errors.role?.message} {...register('role')} />
        <AccessFields renderSitePicker={renderSitePicker} canGrantAllSites={canGrantAllSites} />
        <DialogActions>
          <Button variant="secondary" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" loading={invite.isPending}>
            Send invitation
          </Button>
        </DialogActions>
      </form>
    </FormProvider>
  );
}
