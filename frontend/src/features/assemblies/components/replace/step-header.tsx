import { cn } from '@/lib/cn';
import { REPLACE_STEPS, STEP_TITLES, type ReplaceStep } from './replace-steps';

/** Where the person is in the flow: "Step 2 of 4", with the steps as a bar. */
export function StepHeader({ step }: { step: ReplaceStep }) {
  const index = REPLACE_STEPS.indexOf(step);
  return (
    <div className="mb-5 flex flex-col gap-2">
      <ol className="grid grid-cols-4 gap-1.5" aria-label="Steps">
        {REPLACE_STEPS.map((s, i) => (
          <li key={s} aria-current={i === index ? 'step' : undefined} className={cn('h-2 rounded-full', i <= index ? 'bg-copper-700' : 'bg-ink-200')}>
            <span className="sr-only">
              {STEP_TITLES[s]}
              {i < index ? ' (done)' : ''}
            </span>
          </li>
        ))}
      </ol>
      <p className="text-sm font-semibold text-ink-700">
        Step {index + 1} of {REPLACE_STEPS.length}
      </p>
      <h2 className="text-2xl font-bold text-ink-950">{STEP_TITLES[step]}</h2>
    </div>
  );
}
