import { Button } from '@/components/ui/button';
import { AlertIcon } from '@/components/ui/icons';
import { closingLine } from '../cautions';

/** Step 3: each caution stated on its own, large, before anything is disconnected. */
export function CautionsStep({ cautions, onNext }: { cautions: string[]; onNext: () => void }) {
  return (
    <div className="flex flex-col gap-5">
      <ol className="flex flex-col gap-3" aria-label="Cautions">
        {cautions.map((caution, i) => (
          <li key={caution} className="flex gap-3 rounded-[var(--radius-control)] border-2 border-danger-700 bg-danger-50 px-4 py-4">
            <span aria-hidden="true" className="flex size-9 shrink-0 items-center justify-center rounded-full bg-danger-700 text-lg font-bold text-white">
              {i + 1}
            </span>
            <p className="text-lg font-semibold text-ink-950">{caution}</p>
          </li>
        ))}
      </ol>
      <p className="flex gap-2 text-ink-900">
        <AlertIcon className="mt-0.5 shrink-0 text-danger-800" />
        <span>{closingLine(cautions)}</span>
      </p>
      <Button size="lg" className="w-full sm:w-auto sm:self-end" onClick={onNext}>
        I have read these: next
      </Button>
    </div>
  );
}
