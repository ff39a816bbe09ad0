import { useId, type InputHTMLAttributes, type ReactNode, type SelectHTMLAttributes, type TextareaHTMLAttributes } from "react";

const controlClass =
  "mt-1 block min-h-11 w-full rounded-lg border border-slate-400 bg-white px-3 py-2 text-slate-900 aria-[invalid=true]:border-danger-600";

interface FieldShellProps {
  label: string;
  error?: string;
  hint?: ReactNode;
  children: (ids: { id: string; describedBy?: string; invalid: boolean }) => ReactNode;
}

/** A label, a control, an optional hint and the field's error, tied together for screen readers. */
export function FieldShell({ label, error, hint, children }: FieldShellProps) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(" ") || undefined;
  return (
    <div className="mb-4">
      <label htmlFor={id} className="block font-bold text-slate-800">
        {label}
      </label>
      {hint && (
        <p id={hintId} className="text-sm text-slate-600">
          {hint}
        </p>
      )}
      {children({ id, describedBy, invalid: !!error })}
      {error && (
        <p id={errorId} className="mt-1 text-sm font-bold text-danger-600" role="alert">
          {error}
        </p>
      )}
    </div>
  );
}

type InputProps = InputHTMLAttributes<HTMLInputElement> & { label: string; error?: string; hint?: ReactNode };

export function TextField({ label, error, hint, className = "", ...props }: InputProps) {
  return (
    <FieldShell label={label} error={error} hint={hint}>
      {({ id, describedBy, invalid }) => (
        <input id={id} aria-describedby={describedBy} aria-invalid={invalid} className={`${controlClass} ${className}`} {...props} />
      )}
    </FieldShell>
  );
}

type SelectProps = SelectHTMLAttributes<HTMLSelectElement> & { label: string; error?: string; hint?: ReactNode; options: { value: string; label: string }[] };

export function SelectField({ label, error, hint, options, className = "", ...props }: SelectProps) {
  return (
    <FieldShell label={label} error={error} hint={hint}>
      {({ id, describedBy, invalid }) => (
        <select id={id} aria-describedby={describedBy} aria-invalid={invalid} className={`${controlClass} ${className}`} {...props}>
          {options.map((option) => (
            <option key={option.value} value={option.value}>
              {option.label}
            </option>
          ))}
        </select>
      )}
    </FieldShell>
  );
}

type TextAreaProps = TextareaHTMLAttributes<HTMLTextAreaElement> & { label: string; error?: string; hint?: ReactNode };

export function TextAreaField({ label, error, hint, className = "", ...props }: TextAreaProps) {
  return (
    <FieldShell label={label} error={error} hint={hint}>
      {({ id, describedBy, invalid }) => (
        <textarea id={id} aria-describedby={describedBy} aria-invalid={invalid} className={`${controlClass} ${className}`} {...props} />
      )}
    </FieldShell>
  );
}

export function CheckboxField({ label, error, ...props }: InputHTMLAttributes<HTMLInputElement> & { label: string; error?: string }) {
  const id = useId();
  return (
    <div className="mb-4">
      <label htmlFor={id} className="flex min-h-11 items-center gap-3 font-bold text-slate-800">
        <input id={id} type="checkbox" className="size-5 accent-copper-700" aria-invalid={!!error} {...props} />
        {label}
      </label>
      {error && (
        <p className="text-sm font-bold text-danger-600" role="alert">
          {error}
        </p>
      )}
    </div>
  );
}
