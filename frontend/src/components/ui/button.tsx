import type { ButtonHTMLAttributes, ReactNode } from 'react';
import { Link, type LinkProps } from 'react-router-dom';
import { cn } from '@/lib/cn';
import { Spinner } from './spinner';

export type ButtonVariant = 'primary' | 'secondary' | 'ghost' | 'danger' | 'on-dark';
export type ButtonSize = 'md' | 'lg';

const base =
  'inline-flex items-center justify-center gap-2 rounded-[var(--radius-control)] font-semibold transition-colors ' +
  'disabled:cursor-not-allowed disabled:opacity-60 aria-disabled:cursor-not-allowed aria-disabled:opacity-60';

const variants: Record<ButtonVariant, string> = {
  primary: 'bg-copper-700 text-white hover:bg-copper-800 active:bg-copper-800',
  secondary: 'border-2 border-ink-400 bg-white text-ink-900 hover:border-ink-600 hover:bg-ink-50',
  ghost: 'text-ink-800 underline-offset-4 hover:bg-ink-100 hover:underline',
  danger: 'bg-danger-700 text-white hover:bg-danger-800',
  'on-dark': 'border-2 border-ink-600 text-white hover:border-ink-300 hover:bg-ink-800',
};

const sizes: Record<ButtonSize, string> = {
  // 44 px is the smallest target; 52 px for the main action of a field form.
  md: 'min-h-11 px-4 text-base',
  lg: 'min-h-13 px-5 text-lg',
};

export function buttonClasses(variant: ButtonVariant = 'primary', size: ButtonSize = 'md', className?: string) {
  return cn(base, variants[variant], sizes[size], className);
}

interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  size?: ButtonSize;
  /** Shows a spinner and blocks a second press while the action runs. */
  loading?: boolean;
  icon?: ReactNode;
}

export function Button({ variant = 'primary', size = 'md', loading = false, icon, className, children, disabled, type = 'button', ...props }: ButtonProps) {
  return (
    <button
      type={type}
      className={buttonClasses(variant, size, className)}
      disabled={disabled || loading}
      aria-busy={loading || undefined}
      {...props}
    >
      {loading ? <Spinner /> : icon}
      {children}
    </button>
  );
}

interface ButtonLinkProps extends LinkProps {
  variant?: ButtonVariant;
  size?: ButtonSize;
  icon?: ReactNode;
}

export function ButtonLink({ variant = 'secondary', size = 'md', icon, className, children, ...props }: ButtonLinkProps) {
  return (
    <Link className={buttonClasses(variant, size, typeof className === 'string' ? className : undefined)} {...props}>
      {icon}
      {children}
    </Link>
  );
}

export const textLinkClasses =
  'font-semibold text-copper-700 underline decoration-2 underline-offset-4 hover:text-copper-800 inline-flex min-h-11 items-center';

export function TextLink({ className, ...props }: LinkProps) {
  return <Link className={cn(textLinkClasses, typeof className === 'string' ? className : undefined)} {...props} />;
}
