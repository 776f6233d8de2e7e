import { useEffect, useId, useRef, type ReactNode } from 'react';
import { createPortal } from 'react-dom';
import { cn } from '@/lib/cn';
import { CloseIcon } from './icons';

const FOCUSABLE = 'a[href], button:not([disabled]), input:not([disabled]), select:not([disabled]), textarea:not([disabled]), [tabindex]:not([tabindex="-1"])';

interface DialogProps {
  open: boolean;
  onClose: () => void;
  title: string;
  description?: ReactNode;
  children: ReactNode;
  /** `alertdialog` for a confirmation that needs an answer. */
  role?: 'dialog' | 'alertdialog';
  size?: 'sm' | 'md' | 'lg';
  /**
   * `sheet`: a form that fills a phone's screen, so every field and the main button are large and
   * nothing behind it can be tapped by mistake; focus starts on the panel, not the first field.
   */
  variant?: 'dialog' | 'sheet';
}

/**
 * A modal panel: focus moves in and stays in, Escape or the close button closes it, and focus
 * returns to what opened it. On a phone it rises from the bottom edge, within thumb reach.
 */
export function Dialog({ open, onClose, title, description, children, role = 'dialog', size = 'md', variant = 'dialog' }: DialogProps) {
  const sheet = variant === 'sheet';
  const titleId = useId();
  const descriptionId = useId();
  const panelRef = useRef<HTMLDivElement>(null);
  const onCloseRef = useRef(onClose);
  onCloseRef.current = onClose;

  useEffect(() => {
    if (!open) return;
    const opener = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    const panel = panelRef.current;
    const focusables = () => (panel ? Array.from(panel.querySelectorAll<HTMLElement>(FOCUSABLE)) : []);
    const first =
      panel?.querySelector<HTMLElement>('[data-autofocus]') ?? (sheet ? null : focusables().find((el) => !el.dataset.dialogClose)) ?? panel;
    first?.focus();

    const handleKeyDown = (event: KeyboardEvent) => {
      if (event.key === 'Escape') {
        event.stopPropagation();
        onCloseRef.current();
        return;
      }
      if (event.key !== 'Tab') return;
      const items = focusables();
      if (items.length === 0) {
        event.preventDefault();
        return;
      }
      const firstItem = items[0]!;
      const lastItem = items[items.length - 1]!;
      if (event.shiftKey && document.activeElement === firstItem) {
        event.preventDefault();
        lastItem.focus();
      } else if (!event.shiftKey && document.activeElement === lastItem) {
        event.preventDefault();
        firstItem.focus();
      }
    };
    document.addEventListener('keydown', handleKeyDown);
    const overflow = document.body.style.overflow;
    document.body.style.overflow = 'hidden';
    return () => {
      document.removeEventListener('keydown', handleKeyDown);
      document.body.style.overflow = overflow;
      opener?.focus();
    };
  }, [open, sheet]);

  if (!open) return null;

  return createPortal(
    <div
      className={cn('fixed inset-0 z-50 flex justify-center bg-ink-950/70 sm:items-center sm:p-6', sheet ? 'items-stretch' : 'items-end')}
      onMouseDown={(event) => {
        if (event.target === event.currentTarget) onClose();
      }}
    >
      <div
        ref={panelRef}
        role={role}
        aria-modal="true"
        aria-labelledby={titleId}
        aria-describedby={description ? descriptionId : undefined}
        tabIndex={-1}
        className={cn(
          'flex w-full flex-col overflow-hidden bg-white shadow-2xl sm:rounded-[var(--radius-card)]',
          sheet ? 'h-dvh sm:h-auto sm:max-h-[92dvh]' : 'max-h-[92dvh] rounded-t-[var(--radius-card)]',
          size === 'sm' && 'sm:max-w-md',
          size === 'md' && 'sm:max-w-xl',
          size === 'lg' && 'sm:max-w-3xl',
        )}
      >
        <div className={cn('flex items-start justify-between gap-4 border-b border-ink-200', sheet ? 'px-4 py-3 sm:px-5 sm:py-4' : 'px-5 py-4')}>
          <div className="flex flex-col gap-1 pt-1.5">
            <h2 id={titleId} className="text-xl font-bold text-ink-950">
              {title}
            </h2>
            {description ? (
              <div id={descriptionId} className="text-ink-600">
                {description}
              </div>
            ) : null}
          </div>
          <button
            type="button"
            onClick={onClose}
            aria-label="Close"
            data-dialog-close="true"
            className={cn('flex shrink-0 items-center justify-center rounded-[var(--radius-control)] text-ink-700 hover:bg-ink-100', sheet ? 'size-12' : 'size-11')}
          >
            <CloseIcon />
          </button>
        </div>
        <div className={cn('overflow-y-auto py-5', sheet ? 'flex-1 px-4 sm:px-5' : 'px-5')}>{children}</div>
      </div>
    </div>,
    document.body,
  );
}

/** The row of buttons at the end of a dialog: the main action last on a desktop, first on a phone. */
export function DialogActions({ children }: { children: ReactNode }) {
  return <div className="mt-6 flex flex-col-reverse gap-3 sm:flex-row sm:justify-end">{children}</div>;
}
