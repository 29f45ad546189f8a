import { useId, type ComponentProps, type ReactNode } from "react";
import { ErrorIcon } from "./icons";

const CONTROL =
  "block w-full rounded-md border bg-ink-900 px-3 py-2 text-ink-50 placeholder:text-ink-500 aria-[invalid=true]:border-fault-400";

type FieldShellProps = { id: string; label: string; hint?: string; error?: string; children: ReactNode };

/** Label, control, hint and error in one place; the error sits right under the field it is about. */
function FieldShell({ id, label, hint, error, children }: FieldShellProps) {
  return (
    <div className="space-y-1.5">
      <label htmlFor={id} className="block text-sm font-medium text-ink-100">
        {label}
      </label>
      {children}
      {hint && !error ? (
        <p id={`${id}-hint`} className="text-sm text-ink-300">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={`${id}-error`} className="flex items-start gap-1.5 text-sm text-fault-300">
          <ErrorIcon className="mt-0.5 size-4" />
          <span>{error}</span>
        </p>
      ) : null}
    </div>
  );
}

function describedBy(id: string, hint?: string, error?: string) {
  return error ? `${id}-error` : hint ? `${id}-hint` : undefined;
}

type TextFieldProps = ComponentProps<"input"> & { label: string; hint?: string; error?: string };

export function TextField({ label, hint, error, id, className = "", ...input }: TextFieldProps) {
  const autoId = useId();
  const fieldId = id ?? autoId;
  return (
    <FieldShell id={fieldId} label={label} hint={hint} error={error}>
      <input
        id={fieldId}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(fieldId, hint, error)}
        className={`${CONTROL} border-ink-600 ${className}`}
        {...input}
      />
    </FieldShell>
  );
}

type SelectFieldProps = ComponentProps<"select"> & { label: string; hint?: string; error?: string };

export function SelectField({ label, hint, error, id, className = "", children, ...select }: SelectFieldProps) {
  const autoId = useId();
  const fieldId = id ?? autoId;
  return (
    <FieldShell id={fieldId} label={label} hint={hint} error={error}>
      <select
        id={fieldId}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(fieldId, hint, error)}
        className={`${CONTROL} border-ink-600 ${className}`}
        {...select}
      >
        {children}
      </select>
    </FieldShell>
  );
}

type TextAreaFieldProps = ComponentProps<"textarea"> & { label: string; hint?: string; error?: string };

export function TextAreaField({ label, hint, error, id, className = "", ...textarea }: TextAreaFieldProps) {
  const autoId = useId();
  const fieldId = id ?? autoId;
  return (
    <FieldShell id={fieldId} label={label} hint={hint} error={error}>
      <textarea
        id={fieldId}
        rows={3}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(fieldId, hint, error)}
        className={`${CONTROL} border-ink-600 ${className}`}
        {...textarea}
      />
    </FieldShell>
  );
}
