import { useId, type InputHTMLAttributes, type ReactNode, type Ref, type SelectHTMLAttributes } from "react";
import { cn } from "../../lib/cn";

type FieldShellProps = {
  id: string;
  label: string;
  hint?: ReactNode;
  error?: string;
  children: ReactNode;
  className?: string;
};

/** Label, control, hint and error message, wired together for assistive technology. */
export function FieldShell({ id, label, hint, error, children, className }: FieldShellProps) {
  return (
    <div className={cn("flex flex-col gap-1.5", className)}>
      <label htmlFor={id} className="text-sm font-medium text-ink">
        {label}
      </label>
      {children}
      {error ? (
        <p id={`${id}-error`} role="alert" className="text-sm text-rose-600">
          {error}
        </p>
      ) : hint ? (
        <p id={`${id}-hint`} className="text-xs text-ink-faint">
          {hint}
        </p>
      ) : null}
    </div>
  );
}

export const controlClass = (invalid: boolean) =>
  cn(
    "h-10 w-full rounded-lg bg-surface px-3 text-[0.95rem] text-ink ring-1 ring-inset transition-shadow",
    "placeholder:text-ink-faint focus:outline-none focus:ring-2",
    invalid ? "ring-rose-600 focus:ring-rose-600" : "ring-line-strong focus:ring-well-500",
  );

type TextFieldProps = InputHTMLAttributes<HTMLInputElement> & {
  label: string;
  hint?: ReactNode;
  error?: string;
  ref?: Ref<HTMLInputElement>;
};

/** A labelled text input; pass react-hook-form's `register(...)` result straight in. */
export function TextField({ label, hint, error, className, id, ref, ...rest }: TextFieldProps) {
  const autoId = useId();
  const fieldId = id ?? autoId;
  return (
    <FieldShell id={fieldId} label={label} hint={hint} error={error} className={className}>
      <input
        id={fieldId}
        ref={ref}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${fieldId}-error` : hint ? `${fieldId}-hint` : undefined}
        className={controlClass(Boolean(error))}
        {...rest}
      />
    </FieldShell>
  );
}

type SelectFieldProps = SelectHTMLAttributes<HTMLSelectElement> & {
  label: string;
  hint?: ReactNode;
  error?: string;
  options: ReadonlyArray<{ value: string; label: string }>;
  ref?: Ref<HTMLSelectElement>;
};

/** A labelled native select. */
export function SelectField({ label, hint, error, options, className, id, ref, ...rest }: SelectFieldProps) {
  const autoId = useId();
  const fieldId = id ?? autoId;
  return (
    <FieldShell id={fieldId} label={label} hint={hint} error={error} className={className}>
      <select
        id={fieldId}
        ref={ref}
        aria-invalid={error ? true : undefined}
        className={cn(controlClass(Boolean(error)), "pr-8")}
        {...rest}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </FieldShell>
  );
}

/** A form-level message (the error that belongs to no single field). */
export function FormMessage({ message, tone = "error" }: { message?: string; tone?: "error" | "info" }) {
  if (!message) return null;
  return (
    <div
      role={tone === "error" ? "alert" : "status"}
      className={cn(
        "rounded-lg px-3 py-2 text-sm",
        tone === "error" ? "bg-rose-50 text-rose-700 ring-1 ring-rose-100" : "bg-well-50 text-well-800 ring-1 ring-well-100",
      )}
    >
      {message}
    </div>
  );
}
