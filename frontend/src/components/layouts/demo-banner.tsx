import { paths } from '@/config/paths';
import { Badge } from '@/components/ui/badge';

/** Marks a demo installation, with the way to the e-mails it has "sent". */
export function DemoBanner() {
  return (
    <div className="flex flex-wrap items-center gap-x-3 gap-y-1 border-b-2 border-copper-300 bg-copper-50 px-4 py-2 text-ink-900">
      <Badge tone="inverse">Demo</Badge>
      <p className="text-sm">
        <span className="sm:hidden">Sample data.</span>
        <span className="hidden sm:inline">This is a demo with sample data. E-mails are not sent out; they are kept to read here.</span>
      </p>
      {/* A page the server renders itself, so a plain link rather than a route. */}
      <a href={paths.demoMail.href} className="inline-flex min-h-11 items-center text-sm font-semibold text-copper-700 underline decoration-2 underline-offset-4 hover:text-copper-800">
        Open sent e-mails
      </a>
    </div>
  );
}
