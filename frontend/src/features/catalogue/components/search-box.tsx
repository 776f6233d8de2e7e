import { useEffect, useRef, useState } from 'react';
import { TextField } from '@/components/ui/field';

const SEARCH_DELAY_MS = 300;

interface SearchBoxProps {
  label: string;
  placeholder: string;
  value: string | undefined;
  onSearch: (q: string | undefined, options?: { replace?: boolean }) => void;
}

/** A search field that asks the server once typing pauses, or at once on Enter. */
export function SearchBox({ label, placeholder, value, onSearch }: SearchBoxProps) {
  const [text, setText] = useState(value ?? '');
  const lastSent = useRef(value ?? '');

  // The address changed from elsewhere (back button, "clear filters"): show what it says.
  useEffect(() => {
    const q = value ?? '';
    if (q !== lastSent.current) {
      lastSent.current = q;
      setText(q);
    }
  }, [value]);

  useEffect(() => {
    const q = text.trim();
    if (q === lastSent.current) return;
    const timer = window.setTimeout(() => {
      lastSent.current = q;
      onSearch(q || undefined, { replace: true });
    }, SEARCH_DELAY_MS);
    return () => window.clearTimeout(timer);
  }, [text, onSearch]);

  return (
    <TextField
      label={label}
      type="search"
      placeholder={placeholder}
      value={text}
      onChange={(event) => setText(event.target.value)}
      onKeyDown={(event) => {
        if (event.key === 'Enter') {
          event.preventDefault();
          const q = text.trim();
          lastSent.current = q;
          onSearch(q || undefined);
        }
      }}
      autoComplete="off"
      spellCheck={false}
    />
  );
}
