import { forwardRef, type ButtonHTMLAttributes } from 'react';

type Variant = 'primary' | 'secondary' | 'ghost' | 'danger';
const styles: Record<Variant, string> = {
  primary: 'bg-kraft text-white hover:bg-kraft-dark disabled:bg-kraft/50',
  secondary: 'bg-white text-ink border border-line hover:border-kraft disabled:text-pencil',
  ghost: 'text-ink hover:bg-kraft-light disabled:text-pencil',
  danger: 'bg-white text-rosehip border border-rosehip/40 hover:bg-rosehip-light disabled:opacity-50',
};

/** The one button; `busy` keeps its width and says what is happening. */
export const Button = forwardRef<HTMLButtonElement, ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant; busy?: boolean; size?: 'sm' | 'md' }>(
  function Button({ variant = 'primary', busy, size = 'md', className = '', children, disabled, ...rest }, ref) {
    const pad = size === 'sm' ? 'px-2.5 py-1 text-sm' : 'px-4 py-2 text-sm';
    return (
      <button
        ref={ref}
        type="button"
        className={`inline-flex items-center justify-center gap-2 rounded-md font-medium transition-colors disabled:cursor-not-allowed ${pad} ${styles[variant]} ${className}`}
        disabled={disabled || busy}
        aria-busy={busy || undefined}
        {...rest}
      >
        {busy && <span className="h-3.5 w-3.5 animate-spin rounded-full border-2 border-current border-t-transparent" aria-hidden />}
        {children}
      </button>
    );
  },
);
