import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { hasAbility, RequireAbility, useCurrentUser } from '@/lib/auth';
import { Button } from '@/components/ui/button';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { PlusIcon } from '@/components/ui/icons';
import { useToast } from '@/components/ui/toast';
import { CatalogueTabs } from '@/features/catalogue/components/catalogue-tabs';
import { ConstructionDialog } from '@/features/catalogue/components/construction-dialog';
import { ConstructionsPanel } from '@/features/catalogue/components/constructions-panel';
import { PageHeader } from '../page-header';

export function ConstructionsPage() {
  return (
    <RequireAbility action="register.read">
      <Constructions />
    </RequireAbility>
  );
}

function Constructions() {
  const user = useCurrentUser();
  const navigate = useNavigate();
  const toast = useToast();
  const [creating, setCreating] = useState(false);
  const canCreate = hasAbility(user, 'constructions.edit');
  const createButton = canCreate ? (
    <Button onClick={() => setCreating(true)} icon={<PlusIcon />}>
      New construction
    </Button>
  ) : undefined;

  return (
    <>
      <PageHeader
        before={<CatalogueTabs />}
        title="Hose constructions"
        description="The hose builds your plant buys, under your own codes. Each one's ratings and compatibility are checked when an assembly built from it is installed."
        actions={createButton}
      />
      <PanelBoundary title="The list of constructions could not be shown">
        <ConstructionsPanel createAction={createButton} />
      </PanelBoundary>
      {canCreate ? (
        <ConstructionDialog
          open={creating}
          onClose={() => setCreating(false)}
          onSaved={(saved) => {
            setCreating(false);
            toast.show({ title: `${saved.code} added` });
            void navigate(paths.catalogue.construction.getHref(saved.id));
          }}
        />
      ) : null}
    </>
  );
}
