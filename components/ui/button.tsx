'use client';

import { useSyncExternalStore, type ButtonHTMLAttributes } from 'react';

type Tone = 'primary' | 'quiet' | 'danger';

const TONES: Record<Tone, string> = {
  primary: 'bg-creek-700 text-white hover:bg-creek-800 disabled:bg-creek-300',
  quiet: 'border border-creek-200 bg-white text-creek-800 hover:bg-creek-50 disabled:text-creek-300',
  danger: 'bg-clay-600 text-white hover:bg-clay-700 disabled:bg-clay-100',
};

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  tone?: Tone;
}

const noSubscription = () => () => {};

/** False in the server's HTML and during hydration, true once React owns the page. */
function useHydrated(): boolean {
  return useSyncExternalStore(
    noSubscription,
    () => true,
    () => false,
  );
}

export function Button({ tone = 'primary', className = '', type = 'button', disabled, ...rest }: ButtonProps) {
  // A submit pressed before the page's script runs would post the form natively and reload it,
  // dropping what was typed; the button waits until the form's own handler is attached.
  const hydrated = useHydrated();
  return (
    <button
      type={type}
      disabled={disabled || (type === 'submit' && !hydrated)}
      className={`inline-flex items-center justify-center gap-2 rounded-md px-3.5 py-2 text-sm font-medium transition-colors disabled:cursor-not-allowed ${TONES[tone]} ${className}`}
      {...rest}
    />
  );
}
