import { CONFIRM_WITH_MAKER, type CompatibilityCell, type CompatibilityRating, type Medium } from '@shared/checks/compatibility';
import type { TemperatureUnit } from '@shared/schemas/auth.schema';
import type { ReferenceDto } from '@shared/schemas/register.schema';
import { fromCelsius, TEMPERATURE_UNIT_SYMBOLS } from '@shared/units/units';
import { cn } from '@/lib/cn';
import { countOf } from '@/lib/format';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { AlertIcon, CheckIcon, CloseIcon } from '@/components/ui/icons';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { TBody, Td, Th, THead, Table, Tr } from '@/components/ui/table';
import { useReference } from '../api/get-reference';
import { useUnits } from '../hooks/use-units';
import { RATING_WORDS, sentenceCase, sourceKind } from '../utils/labels';

interface Row {
  medium: Medium;
  cell: CompatibilityCell | null;
}

const NO_DATA = 'No data — confirm with the maker';

/** A medium's temperature band ("70–95 °C") in the reader's unit: "158–203 °F". */
export function temperatureBand(text: string, unit: TemperatureUnit): string {
  if (text === 'any') return 'Any';
  if (unit === 'C') return text;
  const f = (c: string) => String(Math.round(fromCelsius(Number(c), unit)));
  return text.replace(/(-?\d+(?:\.\d+)?)(?:–(-?\d+(?:\.\d+)?))? °C/g, (_m, low: string, high: string | undefined) =>
    `${f(low)}${high ? `–${f(high)}` : ''} ${TEMPERATURE_UNIT_SYMBOLS[unit]}`,
  );
}

/** The word, a symbol of its own shape and a tint: the word and the shape carry the meaning, never the tint alone. */
function RatingMark({ rating }: { rating: CompatibilityRating | null }) {
  const base = 'inline-flex items-center gap-1.5 rounded-full border px-2.5 py-0.5 text-sm font-bold whitespace-nowrap';
  switch (rating) {
    case 'suitable':
      return (
        <span className={cn(base, 'border-success-700/40 bg-success-100 text-success-700')}>
          <CheckIcon className="size-4" /> {RATING_WORDS.suitable}
        </span>
      );
    case 'limited':
      return (
        <span className={cn(base, 'border-copper-300 bg-copper-100 text-copper-800')}>
          <AlertIcon className="size-4" /> {RATING_WORDS.limited}
        </span>
      );
    case 'unsuitable':
      return (
        <span className={cn(base, 'border-danger-700/40 bg-danger-100 text-danger-800')}>
          <CloseIcon className="size-4" /> {RATING_WORDS.unsuitable}
        </span>
      );
    default:
      return (
        <span className={cn(base, 'border-dashed border-ink-400 bg-white text-ink-700')}>
          <span aria-hidden="true" className="font-mono">
            ?
          </span>{' '}
          No data
        </span>
      );
  }
}

/** Where the cell comes from, with the warning a cell from memory needs. */
function SourceText({ cell }: { cell: CompatibilityCell | null }) {
  if (!cell) return <span className="text-ink-700">{NO_DATA}</span>;
  const kind = sourceKind(cell.source);
  if (kind === 'from-memory') {
    return (
      <>
        <span className="font-semibold text-ink-950">From memory</span>
        <strong className="mt-0.5 flex items-start gap-1 font-semibold text-danger-800">
          <AlertIcon className="mt-0.5 size-4 shrink-0" />
          {CONFIRM_WITH_MAKER}
        </strong>
      </>
    );
  }
  if (kind === 'common-practice') return <span className="text-ink-900">{sentenceCase(cell.source)}</span>;
  return <cite className="text-ink-900 not-italic">{cell.source}</cite>;
}

function rowsOf(reference: ReferenceDto, compound: string): Row[] {
  const table = reference.compatibility[compound as keyof ReferenceDto['compatibility']] ?? {};
  return reference.media.map((medium) => ({ medium, cell: table[medium.code] ?? null }));
}

function summary(rows: Row[]): string {
  const n = (test: (row: Row) => boolean) => rows.filter(test).length;
  const parts = [
    `${n((r) => r.cell?.rating === 'suitable')} suitable`,
    `${n((r) => r.cell?.rating === 'limited')} limited`,
    `${n((r) => r.cell?.rating === 'unsuitable')} not suitable`,
    `${n((r) => r.cell == null)} with no data`,
  ];
  const memory = n((r) => r.cell != null && sourceKind(r.cell.source) === 'from-memory');
  return `${countOf(rows.length, 'medium', 'media')}: ${parts.join(', ')}. ${memory} of the ratings are from memory and need confirming.`;
}

/** The tube compound against every medium of the reference table: the rating in words and its source. */
export function CompatibilityTable({ tubeCompound }: { tubeCompound: string | null }) {
  const reference = useReference();
  const { temperatureUnit } = useUnits();

  if (reference.isPending) return <SkeletonBlock label="Loading the compatibility table…" lines={6} />;
  if (reference.isError) {
    return (
      <ErrorState
        title="The compatibility table could not be loaded"
        error={reference.error}
        onRetry={() => void reference.refetch()}
        retrying={reference.isFetching}
      />
    );
  }
  if (!tubeCompound) {
    return (
      <EmptyState title="No tube compound recorded">
        Without the tube compound nothing can be said about which media this hose takes. Edit the construction to add it, from the maker's
        data sheet.
      </EmptyState>
    );
  }
  const compound = reference.data.tubeCompounds.find((c) => c.code === tubeCompound);
  if (!compound) {
    return (
      <EmptyState title={`${tubeCompound} is not in the compatibility table`}>
        Ferrule has no ratings for this compound. {CONFIRM_WITH_MAKER}
      </EmptyState>
    );
  }
  if (reference.data.media.length === 0) {
    return <EmptyState title="No media in the reference table">The server lists no media to rate this compound against.</EmptyState>;
  }

  const rows = rowsOf(reference.data, compound.code);
  const caption = `${compound.code} (${compound.name}) tube against each medium`;

  return (
    <div className="flex flex-col gap-3">
      <p className="text-ink-800">{summary(rows)}</p>
      <p className="text-sm text-ink-700">
        A rating is for the tube only, at the concentration and temperature given. Where a rating is from memory or missing, {CONFIRM_WITH_MAKER.charAt(0).toLowerCase() + CONFIRM_WITH_MAKER.slice(1)}
      </p>
      <div className="hidden md:block">
        <Table aria-label={caption}>
          <THead>
            <tr>
              <Th>Medium</Th>
              <Th>Concentration</Th>
              <Th>Temperature</Th>
              <Th>Rating</Th>
              <Th>Source</Th>
            </tr>
          </THead>
          <TBody>
            {rows.map(({ medium, cell }) => (
              <Tr key={medium.code} className={cn(cell && sourceKind(cell.source) === 'from-memory' && 'bg-copper-50/60')}>
                <Td>
                  <span className="font-semibold text-ink-950">{sentenceCase(medium.name)}</span>
                </Td>
                <Td className="whitespace-nowrap">{medium.concentration === 'any' ? 'Any' : medium.concentration}</Td>
                <Td className="whitespace-nowrap">{temperatureBand(medium.temperature, temperatureUnit)}</Td>
                <Td>
                  <RatingMark rating={cell?.rating ?? null} />
                </Td>
                <Td className="max-w-md text-sm">
                  <SourceText cell={cell} />
                </Td>
              </Tr>
            ))}
          </TBody>
        </Table>
      </div>
      <ul className="flex flex-col gap-2 md:hidden" aria-label={caption}>
        {rows.map(({ medium, cell }) => (
          <li key={medium.code} className="flex flex-col gap-2 rounded-[var(--radius-control)] border border-ink-200 bg-white p-3">
            <div className="flex flex-wrap items-start justify-between gap-2">
              <div className="flex flex-col">
                <span className="font-semibold text-ink-950">{sentenceCase(medium.name)}</span>
                <span className="text-sm text-ink-700">
                  {medium.concentration === 'any' ? 'Any concentration' : medium.concentration} ·{' '}
                  {medium.temperature === 'any' ? 'any temperature' : temperatureBand(medium.temperature, temperatureUnit)}
                </span>
              </div>
              <RatingMark rating={cell?.rating ?? null} />
            </div>
            <div className="text-sm">
              <span className="text-ink-600">Source: </span>
              <SourceText cell={cell} />
            </div>
          </li>
        ))}
      </ul>
    </div>
  );
}
