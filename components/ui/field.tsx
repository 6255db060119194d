import type { InputHTMLAttributes, ReactNode, SelectHTMLAttributes, TextareaHTMLAttributes } from 'react';

const CONTROL =
  'mt-1 block w-full rounded-md border border-creek-200 bg-white px-3 py-2 text-sm text-creek-950 shadow-sm placeholder:text-creek-300 focus:border-creek-500 focus:outline-none aria-[invalid=true]:border-clay-500';

interface FieldShellProps {
  id: string;
  label: string;
  hint?: string;
  errors?: string[];
  children: ReactNode;
}

/** A label, the control, a hint and the field's errors, tied together for screen readers. */
export function FieldShell({ id, label, hint, errors, children }: FieldShellProps) {
  return (
    <div>
      <label htmlFor={id} className="block text-sm font-medium text-creek-900">
        {label}
      </label>
      {children}
      {hint && !errors?.length && (
        <p id={`${id}-hint`} className="mt-1 text-xs text-creek-600">
          {hint}
        </p>
      )}
      {errors && errors.length > 0 && (
        <p id={`${id}-error`} role="alert" className="mt-1 text-xs font-medium text-clay-600">
          {errors.join(' ')}
        </p>
      )}
    </div>
  );
}

function describedBy(id: string, hint?: string, errors?: string[]) {
  if (errors?.length) return `${id}-error`;
  return hint ? `${id}-hint` : undefined;
}

type Common = { id: string; label: string; hint?: string; errors?: string[] };

export function TextField({ id, label, hint, errors, ...input }: Common & InputHTMLAttributes<HTMLInputElement>) {
  return (
    <FieldShell id={id} label={label} hint={hint} errors={errors}>
      <input
        id={id}
        name={id}
        className={CONTROL}
        aria-invalid={errors?.length ? true : undefined}
        aria-describedby={describedBy(id, hint, errors)}
        {...input}
      />
    </FieldShell>
  );
}

export function TextAreaField({
  id,
  label,
  hint,
  errors,
  ...input
}: Common & TextareaHTMLAttributes<HTMLTextAreaElement>) {
  return (
    <FieldShell id={id} label={label} hint={hint} errors={errors}>
      <textarea
        id={id}
        name={id}
        className={CONTROL}
        aria-invalid={errors?.length ? true : undefined}
        aria-describedby={describedBy(id, hint, errors)}
        {...input}
      />
    </FieldShell>
  );
}

export function SelectField({
  id,
  label,
  hint,
  errors,
  children,
  ...input
}: Common & SelectHTMLAttributes<HTMLSelectElement>) {
  return (
    <FieldShell id={id} label={label} hint={hint} errors={errors}>
      <select
        id={id}
        name={id}
        className={CONTROL}
        aria-invalid={errors?.length ? true : undefined}
        aria-describedby={describedBy(id, hint, errors)}
        {...input}
      >
        {children}
      </select>
    </FieldShell>
  );
}
