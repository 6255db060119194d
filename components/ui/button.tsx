import type { ButtonHTMLAttributes } from 'react';

type Tone = 'primary' | 'quiet' | 'danger';

const TONES: Record<Tone, string> = {
  primary: 'bg-creek-700 text-white hover:bg-creek-800 disabled:bg-creek-300',
  quiet: 'border border-creek-200 bg-white text-creek-800 hover:bg-creek-50 disabled:text-creek-300',
  danger: 'bg-clay-600 text-white hover:bg-clay-700 disabled:bg-clay-100',
};

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  tone?: Tone;
}

export function Button({ tone = 'primary', className = '', type = 'button', ...rest }: ButtonProps) {
  return (
    <button
      type={type}
      className={`inline-flex items-center justify-center gap-2 rounded-md px-3.5 py-2 text-sm font-medium transition-colors disabled:cursor-not-allowed ${TONES[tone]} ${className}`}
      {...rest}
    />
  );
}
