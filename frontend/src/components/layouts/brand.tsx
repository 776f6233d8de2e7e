import { FerruleMark } from '@/components/ui/icons';
import { cn } from '@/lib/cn';

export function Brand({ companyName, tone = 'dark', className }: { companyName?: string | null; tone?: 'dark' | 'light'; className?: string }) {
  return (
    <div className={cn('flex items-center gap-3', className)}>
      <FerruleMark className={cn('size-9 shrink-0', tone === 'dark' ? 'text-copper-400' : 'text-copper-700')} />
      <div className="flex flex-col leading-tight">
        <span className={cn('text-xl font-bold tracking-tight', tone === 'dark' ? 'text-white' : 'text-ink-950')}>Ferrule</span>
        {companyName ? <span className={cn('text-sm', tone === 'dark' ? 'text-ink-200' : 'text-ink-600')}>{companyName}</span> : null}
      </div>
    </div>
  );
}
