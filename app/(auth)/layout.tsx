import type { ReactNode } from 'react';
import { Wordmark } from '@/components/shell/wordmark';

export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <main className="flex min-h-screen flex-col items-center justify-center bg-gradient-to-b from-creek-50 to-paper px-4 py-10">
      <div className="mb-6">
        <Wordmark />
      </div>
      <div className="w-full max-w-sm rounded-xl border border-creek-100 bg-white p-6 shadow-sm">{children}</div>
      <p className="mt-6 max-w-sm text-center text-xs text-creek-600">
        Gravity and ram-pump water lines, from the walked survey to the seasonal drain-down.
      </p>
    </main>
  );
}
