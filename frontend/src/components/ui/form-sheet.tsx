import type { ReactNode } from 'react';
import { Dialog } from './dialog';

interface FormSheetProps {
  open: boolean;
  onClose: () => void;
  title: string;
  description?: ReactNode;
  children: ReactNode;
  size?: 'md' | 'lg';
}

/**
 * A form over the page: on a phone it fills the screen; on a desktop it is a centred dialog.
 * Focus moves in and stays in, Escape or Close closes it, and focus returns to what opened it.
 */
export function FormSheet(props: FormSheetProps) {
  return <Dialog {...props} variant="sheet" />;
}

/**
 * The buttons at the end of a sheet, after everything the person must read: full width and the
 * main one first on a phone, right-aligned on a desktop.
 */
export function FormSheetActions({ children }: { children: ReactNode }) {
  return <div className="mt-6 flex flex-col-reverse gap-3 sm:flex-row sm:justify-end [&>*]:min-h-13 sm:[&>*]:min-h-11">{children}</div>;
}
