import type { ButtonHTMLAttributes } from 'react';

export type ButtonVariant = 'primary' | 'secondary' | 'quiet';

const base =
  'inline-flex items-center justify-center gap-2 rounded-md font-bold leading-none transition-colors ' +
  'disabled:cursor-not-allowed disabled:opacity-60';

const variants: Record<ButtonVariant, string> = {
  primary: 'bg-ink px-4 py-2.5 text-paper-raised hover:bg-ink/85',
  secondary: 'border border-rule bg-paper-raised px-3 py-2 text-ink hover:border-ink hover:bg-paper-sunk',
  quiet: 'px-2 py-1.5 text-ink-soft hover:bg-paper-sunk hover:text-ink',
};

/** The class names of a button, for links that must look like one (a full-page navigation). */
export function buttonClasses(variant: ButtonVariant = 'primary', extra = ''): string {
  return `${base} ${variants[variant]} ${extra}`.trim();
}

type ButtonProps = ButtonHTMLAttributes<HTMLButtonElement> & { variant?: ButtonVariant };

export function Button({ variant = 'primary', className = '', type = 'button', ...props }: ButtonProps) {
  return <button type={type} className={buttonClasses(variant, className)} {...props} />;
}
