import { useState } from 'react';
import type { RemovalReason } from '@shared/services/removal-reasons';
import { Button } from '@/components/ui/button';
import { ChoiceTiles } from '../choice-tiles';
import { REMOVAL_REASON_OPTIONS } from '../remove-sheet';

/** Step 1: why the old assembly came out, as big tiles. The reason decides how its life counts. */
export function ReasonStep({ reason, onNext }: { reason: RemovalReason | null; onNext: (reason: RemovalReason) => void }) {
  const [chosen, setChosen] = useState<RemovalReason | null>(reason);
  const [error, setError] = useState<string | undefined>();
  return (
    <div className="flex flex-col gap-5">
      <ChoiceTiles
        legend="Why did it come out?"
        hideLegend
        options={REMOVAL_REASON_OPTIONS}
        value={chosen}
        onChange={(value) => {
          setChosen(value);
          setError(undefined);
        }}
        error={error}
      />
      <Button size="lg" className="w-full sm:w-auto sm:self-end" onClick={() => (chosen ? onNext(chosen) : setError('Choose why it came out'))}>
        Next: pick the new assembly
      </Button>
    </div>
  );
}
