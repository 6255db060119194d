'use client';

import { useState } from 'react';
import { useDecimalMark } from '@/components/ui/decimal-mark';
import { parseTypedNumber } from '@/lib/units/typed-number';

export interface NumberCellProps {
  label: string;
  /** The value as shown (already in display units); null for an empty cell. */
  value: number | null;
  digits: number;
  allowEmpty?: boolean;
  onCommit: (value: number | null) => void;
}

/**
 * A number typed into a table cell, committed when the field is left (one undo step per change).
 * Text that is not a number is refused on the spot with a message.
 */
export function NumberCell({ label, value, digits, allowEmpty = false, onCommit }: NumberCellProps) {
  const mark = useDecimalMark();
  const shown = value === null ? '' : mark === ',' ? value.toFixed(digits).replace('.', ',') : value.toFixed(digits);
  const [text, setText] = useState(shown);
  const [error, setError] = useState<string | null>(null);
  const [last, setLast] = useState(shown);
  if (shown !== last) {
    // The point changed outside this cell (undo, reorder): show the new value.
    setLast(shown);
    setText(shown);
  }
  function commit() {
    const trimmed = text.trim();
    if (trimmed === shown) return setError(null);
    const read = parseTypedNumber(trimmed, mark);
    if (!read.ok) return setError(`${label}: ${read.error}`);
    if (read.value === null) {
      if (!allowEmpty) return setError(`${label} must be a number`);
      setError(null);
      return onCommit(null);
    }
    setError(null);
    onCommit(read.value);
  }
  return (
    <span className="block">
      <input
        aria-label={label}
        value={text}
        inputMode="decimal"
        onChange={(e) => setText(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => e.key === 'Enter' && (e.target as HTMLInputElement).blur()}
        aria-invalid={error ? true : undefined}
        className="tabular w-24 rounded border border-creek-100 px-1.5 py-0.5 text-right text-sm aria-[invalid=true]:border-clay-500"
      />
      {error && (
        <span role="alert" className="block text-xs text-clay-600">
          {error}
        </span>
      )}
    </span>
  );
}
