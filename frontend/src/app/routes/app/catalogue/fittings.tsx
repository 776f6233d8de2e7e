import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { hasAbility, RequireAbility, useCurrentUser } from '@/lib/auth';
import { Button } from '@/components/ui/button';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { PlusIcon } from '@/components/ui/icons';
import { useToast } from '@/components/ui/toast';
import { CatalogueTabs } from '@/features/catalogue/components/catalogue-tabs';
import { FittingTypeDialog } from '@/features/catalogue/components/fitting-type-dialog';
import { FittingTypesPanel } from '@/features/catalogue/components/fitting-types-panel';
import { PageHeader } from '../page-header';

export function FittingTypesPage() {
  return (
    <RequireAbility action="register.read">
      <FittingTypes />
    </RequireAbility>
  );
}

function FittingTypes() {
  const user = useCurrentUser();
  const navigate = useNavigate();
  const toast = useToast();
  const [creating, setCreating] = useState(false);
  const canCreate = hasAbility(user, 'fitting-types.edit');
  const createButton = canCreate ? (
    <Button onClick={() => setCreating(true)} icon={<PlusIcon />}>
      New fitting type
    </Button>
  ) : undefined;

  return (
    <>
      <PageHeader
        before={<CatalogueTabs />}
        title="End fittings"
        description="The fitting types your hose shop fits, with the rating of each size. An assembly is allowed no more pressure than its weakest fitting."
        actions={createButton}
      />
      <PanelBoundary title="The list of fitting types could not be shown">
        <FittingTypesPanel createAction={createButton} />
      </PanelBoundary>
      {canCreate ? (
        <FittingTypeDialog
          open={creating}
          onClose={() => setCreating(false)}
          onSaved={(saved) => {
            setCreating(false);
            toast.show({ title: `${saved.code} added` });
            void navigate(paths.catalogue.fitting.getHref(saved.id));
          }}
        />
      ) : null}
    </>
  );
}
