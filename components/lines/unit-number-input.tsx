'use client';

import { useState } from 'react';
import { useDecimalMark } from '@/components/ui/decimal-mark';
import { formatTypedNumber, parseTypedNumber, type DecimalMark } from '@/lib/units/typed-number';
import { useReportUnsaved } from './unsaved-values';

export interface UnitNumberInputProps {
  id: string;
  label: string;
  /** The value in display units (undefined = empty). */
  value: number | undefined;
  unit: string;
  digits?: number;
  /** Empty is allowed and commits undefined. */
  optional?: boolean;
  disabled?: boolean;
  /** Commits a display-unit value; returns an error message to show, or null. */
  onCommit: (value: number | undefined) => string | null;
  hint?: string;
  /** Greyed example in an empty box (a figure in the project's units; nothing is saved from it). */
  placeholder?: string;
  compact?: boolean;
  /** Errors found on the value elsewhere (a form's schema, the server), shown beside the box like its own. */
  errors?: readonly string[];
}

const format = (v: number | undefined, digits: number, mark: DecimalMark) =>
  v === undefined ? '' : formatTypedNumber(Number(v.toFixed(digits)), mark);

/** A number in the project's units that commits on Enter or leaving the field, with its error beside it. */
export function UnitNumberInput({
  id,
  label,
  value,
  unit,
  digits = 2,
  optional,
  disabled,
  onCommit,
  hint,
  placeholder,
  compact,
  errors,
}: UnitNumberInputProps) {
  const mark = useDecimalMark();
  const [text, setText] = useState(format(value, digits, mark));
  const [ownError, setError] = useState<string | null>(null);
  const error = ownError ?? (errors && errors.length > 0 ? errors.join(' ') : null);
  // A new value from outside (undo, a fix, a save) replaces what is shown.
  const [shown, setShown] = useState({ value, mark });
  if (shown.value !== value || shown.mark !== mark) {
    setShown({ value, mark });
    setText(format(value, digits, mark));
    // The refused text is gone; so is its complaint.
    if (shown.value !== value) setError(null);
  }
  // A refused value is not saved: the editor's save state must not say it is.
  useReportUnsaved(id, ownError ? label : null);

  function commit() {
    const trimmed = text.trim();
    if (trimmed === format(value, digits, mark)) return setError(null);
    const read = parseTypedNumber(trimmed, mark);
    if (!read.ok) return setError(`${label}: ${read.error} in ${unit}`);
    if (read.value === null) {
      if (!optional) return setError(`${label} is required`);
      return setError(onCommit(undefined));
    }
    const problem = onCommit(read.value);
    setError(problem);
    if (problem) return;
  }

  return (
    <div className={compact ? '' : 'min-w-36'}>
      <label htmlFor={id} className={compact ? 'sr-only' : 'block text-xs font-medium text-creek-900'}>
        {label} ({unit})
      </label>
      <input
        id={id}
        inputMode="decimal"
        value={text}
        placeholder={placeholder}
        disabled={disabled}
        onChange={(e) => setText(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => {
          if (e.key === 'Enter') {
            e.preventDefault();
            commit();
          }
        }}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : hint ? `${id}-hint` : undefined}
        className={`tabular block w-full rounded-md border border-creek-200 bg-white px-2 py-1 text-sm text-creek-950 disabled:bg-creek-50 disabled:text-creek-700 aria-[invalid=true]:border-clay-500 ${compact ? '' : 'mt-1'}`}
      />
      {hint && !error && !compact && (
        <p id={`${id}-hint`} className="mt-0.5 text-xs text-creek-600">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} role="alert" className="mt-0.5 text-xs font-medium text-clay-600">
          {error}
        </p>
      )}
    </div>
  );
}
