import { Button } from '@/components/ui/button';

interface ListPagerProps {
  /** What the pages are of, for the navigation's name: "constructions". */
  noun: string;
  page: number;
  pageCount: number;
  canPrevious: boolean;
  canNext: boolean;
  onPrevious: () => void;
  onNext: () => void;
  first: number;
  last: number;
  total: number;
}

/** Previous and next page of a list paged by the server, with where the reader is. */
export function ListPager({ noun, page, pageCount, canPrevious, canNext, onPrevious, onNext, first, last, total }: ListPagerProps) {
  if (pageCount <= 1) return null;
  return (
    <nav aria-label={`Pages of ${noun}`} className="flex flex-wrap items-center justify-between gap-3">
      <p className="text-ink-700">
        Showing {first.toLocaleString()}–{last.toLocaleString()} of {total.toLocaleString()} · page {page} of {pageCount}
      </p>
      <div className="flex gap-2">
        <Button variant="secondary" onClick={onPrevious} disabled={!canPrevious}>
          Previous page
        </Button>
        <Button variant="secondary" onClick={onNext} disabled={!canNext}>
          Next page
        </Button>
      </div>
    </nav>
  );
}
