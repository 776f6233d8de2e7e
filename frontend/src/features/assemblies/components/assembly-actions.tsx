import { useState } from 'react';
import type { AssemblyDto } from '@shared/schemas/assemblies.schema';
import { paths } from '@/config/paths';
import { hasAbility, useCurrentUser } from '@/lib/auth';
import { Button, ButtonLink } from '@/components/ui/button';
import { InstallSheet } from './install-sheet';
import { OverrideSheet, overridableFails } from './override-sheet';
import { ProofTestSheet } from './proof-test-sheet';
import { RemoveSheet } from './remove-sheet';
import { ReturnToStockSheet } from './return-to-stock-sheet';
import { ScrapSheet } from './scrap-sheet';
import { TagOutSheet } from './tag-out-sheet';

export type AssemblyAction = 'proofTest' | 'install' | 'tagOut' | 'remove' | 'returnToStock' | 'scrap' | 'override';

interface AssemblyActionsProps {
  assembly: AssemblyDto;
  cautions: string[];
  /** The form open from outside, e.g. the proof test offered right after a build. */
  open: AssemblyAction | null;
  onOpen: (action: AssemblyAction | null) => void;
}

/** The actions the server says this user may take on this assembly now, each opening its form. */
export function AssemblyActions({ assembly, cautions, open, onOpen }: AssemblyActionsProps) {
  const me = useCurrentUser();
  const a = assembly.abilities;
  const close = () => onOpen(null);
  const canOverride = a.override && overridableFails(assembly).length > 0;
  const any = a.replace || a.tagOut || a.remove || a.install || a.proofTest || a.returnToStock || a.scrap || canOverride;
  const [proofTestFromReturn, setProofTestFromReturn] = useState(false);

  if (!any) {
    const mayAct = (['assemblies.replace', 'assemblies.remove', 'assemblies.proof-test', 'assemblies.install'] as const).some((action) => hasAbility(me, action));
    return (
      <p className="text-ink-700">
        {!mayAct
          ? 'You can see this assembly but not change it.'
          : assembly.status === 'scrapped'
            ? 'It is scrapped: nothing more is done to it. Its history stays.'
            : 'Nothing can be done to it in its present state.'}
      </p>
    );
  }

  return (
    <>
      <div className="grid grid-cols-1 gap-2 min-[400px]:grid-cols-2 sm:flex sm:flex-wrap" role="group" aria-label="Actions">
        {a.replace ? (
          <ButtonLink to={paths.assemblies.replace.getHref(assembly.id)} variant="primary" size="lg">
            Replace
          </ButtonLink>
        ) : null}
        {a.install ? (
          <Button size="lg" onClick={() => onOpen('install')}>
            Install
          </Button>
        ) : null}
        {a.proofTest ? (
          <Button size="lg" variant={a.install ? 'secondary' : 'primary'} onClick={() => onOpen('proofTest')}>
            Proof test
          </Button>
        ) : null}
        {a.tagOut ? (
          <Button size="lg" variant="secondary" onClick={() => onOpen('tagOut')}>
            Tag out
          </Button>
        ) : null}
        {a.remove ? (
          <Button size="lg" variant="secondary" onClick={() => onOpen('remove')}>
            Remove
          </Button>
        ) : null}
        {a.returnToStock ? (
          <Button size="lg" variant="secondary" onClick={() => onOpen('returnToStock')}>
            Back into stock
          </Button>
        ) : null}
        {canOverride ? (
          <Button size="lg" variant="secondary" onClick={() => onOpen('override')}>
            Accept failed checks
          </Button>
        ) : null}
        {a.scrap ? (
          <Button size="lg" variant="secondary" onClick={() => onOpen('scrap')}>
            Scrap
          </Button>
        ) : null}
      </div>
      <ProofTestSheet
        assembly={assembly}
        open={open === 'proofTest'}
        onClose={() => {
          close();
          if (proofTestFromReturn) {
            setProofTestFromReturn(false);
            if (a.returnToStock) onOpen('returnToStock');
          }
        }}
      />
      <InstallSheet assembly={assembly} open={open === 'install'} onClose={close} />
      <TagOutSheet assembly={assembly} cautions={cautions} open={open === 'tagOut'} onClose={close} />
      <RemoveSheet assembly={assembly} cautions={cautions} open={open === 'remove'} onClose={close} />
      <ReturnToStockSheet
        assembly={assembly}
        open={open === 'returnToStock'}
        onClose={close}
        onProofTest={
          a.proofTest
            ? () => {
                setProofTestFromReturn(true);
                onOpen('proofTest');
              }
            : undefined
        }
      />
      <ScrapSheet assembly={assembly} open={open === 'scrap'} onClose={close} />
      <OverrideSheet assembly={assembly} open={open === 'override'} onClose={close} />
    </>
  );
}
