import { AlertIcon } from '@/components/ui/icons';
import { cn } from '@/lib/cn';

/** The closing words every caution list carries: the product supports the decision, it does not make it. */
export const COMPETENT_PERSON =
  'Follow local codes, the site’s procedures and the instructions of the site’s competent person. Ferrule supports these decisions; it does not replace their judgement.';

const SUPPORTS_ONLY = 'Ferrule supports these decisions; it does not replace the judgement of the site’s competent person.';

/** The closing line: the deference to local codes and the competent person, unless the server's cautions already say it. */
export function closingLine(cautions: string[]): string {
  return cautions.some((c) => /competent person/i.test(c) && /local codes/i.test(c)) ? SUPPORTS_ONLY : COMPETENT_PERSON;
}

/**
 * The server's cautions for work that can hurt someone, stated one by one, before the button
 * that confirms the work.
 */
export function Cautions({ cautions, title = 'Before you start', className }: { cautions: string[]; title?: string; className?: string }) {
  return (
    <section aria-label="Cautions" className={cn('rounded-[var(--radius-control)] border-2 border-danger-700 bg-danger-50 px-4 py-4', className)}>
      <h3 className="flex items-center gap-2 text-lg font-bold text-danger-800">
        <AlertIcon className="shrink-0" />
        {title}
      </h3>
      <ul className="mt-2 flex flex-col gap-2">
        {cautions.map((caution) => (
          <li key={caution} className="flex gap-2 text-ink-950">
            <span aria-hidden="true" className="mt-2.5 size-2 shrink-0 rounded-full bg-danger-700" />
            <span className="font-semibold">{caution}</span>
          </li>
        ))}
      </ul>
      <p className="mt-3 border-t border-danger-700/30 pt-3 text-ink-900">{closingLine(cautions)}</p>
    </section>
  );
}
