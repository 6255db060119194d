import { TextField } from '@/components/ui/field';

export interface NumberFieldProps {
  id: string;
  label: string;
  unit?: string;
  value: string;
  onChange: (value: string) => void;
  errors?: string[];
  hint?: string;
}

/** A number box labelled with its unit ("Fall (ft)"); text, so a half-typed value is not lost. */
export function NumberField({ id, label, unit, value, onChange, errors, hint }: NumberFieldProps) {
  return (
    <TextField
      id={id}
      label={unit ? `${label} (${unit})` : label}
      inputMode="decimal"
      autoComplete="off"
      value={value}
      onChange={(event) => onChange(event.target.value)}
      errors={errors}
      hint={hint}
    />
  );
}
