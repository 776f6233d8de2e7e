import { useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { AssemblyDto } from '@shared/schemas/assemblies.schema';
import type { RemovalReason } from '@shared/services/removal-reasons';
import { formatTagCode } from '@shared/tags/tag-code';
import { paths } from '@/config/paths';
import { Alert } from '@/components/ui/alert';
import { Button, ButtonLink } from '@/components/ui/button';
import type { LifecycleAnswer } from '../../api/lifecycle-mutation';
import { useSubmissionKey } from '../../hooks/use-submission-key';
import { CautionsStep } from './cautions-step';
import { ConfirmStep } from './confirm-step';
import { ReasonStep } from './reason-step';
import { ReplaceDone } from './replace-done';
import { parseReplaceState, REPLACE_STEPS, replaceStateToParams, type ReplaceState } from './replace-steps';
import { StepHeader } from './step-header';
import { StockStep } from './stock-step';

interface Done {
  installed: AssemblyDto;
  reason: RemovalReason;
}

/** Replacing a hose on a phone, one step at a time: why, which new one, the cautions, confirm. */
export function ReplaceFlow({ old, cautions }: { old: AssemblyDto; cautions: string[] }) {
  const [params, setParams] = useSearchParams();
  const state = parseReplaceState(params);
  const submission = useSubmissionKey();
  const [done, setDone] = useState<Done | null>(null);
  const [oldAsItWas] = useState(old);

  const go = (patch: Partial<ReplaceState>) => {
    setParams(replaceStateToParams({ ...state, ...patch }));
    window.scrollTo(0, 0);
  };

  if (done) return <ReplaceDone old={oldAsItWas} installed={done.installed} reason={done.reason} />;

  if (!old.abilities.replace) {
    return (
      <Alert tone="info" title="This assembly cannot be replaced now">
        <p>
          {old.status === 'installed' || old.status === 'tagged_out'
            ? 'Your role does not include replacing assemblies.'
            : `It is not installed at a position (it is ${old.status.replace('_', ' ')}), so there is nothing to replace it in.`}
        </p>
        <ButtonLink to={paths.assemblies.detail.getHref(old.id)} className="mt-2">
          Back to {formatTagCode(old.number)}
        </ButtonLink>
      </Alert>
    );
  }

  const index = REPLACE_STEPS.indexOf(state.step);
  const back = index > 0 ? () => go({ step: REPLACE_STEPS[index - 1] }) : null;
  const returnTo = `${paths.assemblies.replace.getHref(old.id)}?${replaceStateToParams({ step: 'cautions', reason: state.reason }).toString()}`;

  return (
    <div className="mx-auto flex max-w-2xl flex-col">
      <StepHeader step={state.step} />
      {state.step === 'reason' ? <ReasonStep reason={state.reason} onNext={(reason) => go({ reason, step: 'new' })} /> : null}
      {state.step === 'new' ? (
        <StockStep
          old={old}
          chosenId={state.newAssemblyId}
          onChoose={(newAssemblyId) => setParams(replaceStateToParams({ ...state, newAssemblyId }), { replace: true })}
          onNext={() => go({ step: 'cautions' })}
          returnTo={returnTo}
        />
      ) : null}
      {state.step === 'cautions' ? <CautionsStep cautions={cautions} onNext={() => go({ step: 'confirm' })} /> : null}
      {state.step === 'confirm' && state.reason && state.newAssemblyId ? (
        <ConfirmStep
          old={old}
          cautions={cautions}
          reason={state.reason}
          newAssemblyId={state.newAssemblyId}
          submission={submission}
          onChangeReason={() => go({ step: 'reason' })}
          onChangeNew={() => go({ step: 'new' })}
          onReplaced={(answer: LifecycleAnswer, reason) => {
            submission.renew();
            setDone({ installed: answer.data, reason });
            window.scrollTo(0, 0);
          }}
        />
      ) : null}
      {back ? (
        <Button variant="ghost" size="lg" onClick={back} className="mt-6 self-start">
          ← Back
        </Button>
      ) : null}
    </div>
  );
}
