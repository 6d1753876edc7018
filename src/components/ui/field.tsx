import { forwardRef, useId, type InputHTMLAttributes, type ReactNode, type SelectHTMLAttributes } from 'react';

type FieldProps = { label: string; error?: string; hint?: ReactNode };

/** A labelled input with its hint and error, wired for screen readers. */
export const TextField = forwardRef<HTMLInputElement, InputHTMLAttributes<HTMLInputElement> & FieldProps>(function TextField(
  { label, error, hint, className = '', id, ...rest },
  ref,
) {
  const auto = useId();
  const fid = id ?? auto;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={fid} className="text-sm font-medium">
        {label}
      </label>
      <input
        ref={ref}
        id={fid}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${fid}-error` : hint ? `${fid}-hint` : undefined}
        className={`rounded-md border bg-white px-3 py-2 text-sm focus:border-kraft ${error ? 'border-rosehip' : 'border-field'}`}
        {...rest}
      />
      {hint && !error && (
        <p id={`${fid}-hint`} className="text-xs text-pencil">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${fid}-error`} className="text-xs text-rosehip" role="alert">
          {error}
        </p>
      )}
    </div>
  );
});

/** A labelled select. */
export const SelectField = forwardRef<HTMLSelectElement, SelectHTMLAttributes<HTMLSelectElement> & FieldProps>(function SelectField(
  { label, error, className = '', id, children, ...rest },
  ref,
) {
  const auto = useId();
  const fid = id ?? auto;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={fid} className="text-sm font-medium">
        {label}
      </label>
      <select ref={ref} id={fid} className="rounded-md border border-field bg-white px-3 py-2 text-sm focus:border-kraft" {...rest}>
        {children}
      </select>
      {error && <p className="text-xs text-rosehip">{error}</p>}
    </div>
  );
});
