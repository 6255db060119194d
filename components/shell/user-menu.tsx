'use client';

import { signOut } from 'next-auth/react';
import Link from 'next/link';
import { useState } from 'react';
import { useSignOutEverywhere } from '@/lib/queries/accounts';

export function UserMenu({ name, email }: { name: string; email: string }) {
  const everywhere = useSignOutEverywhere();
  const [open, setOpen] = useState(false);
  return (
    <div className="relative" onKeyDown={(e) => e.key === 'Escape' && setOpen(false)}>
      <button
        type="button"
        aria-label="Account menu"
        aria-expanded={open}
        aria-controls="account-menu"
        onClick={() => setOpen((o) => !o)}
        className="rounded-md px-2 py-1 text-sm hover:bg-creek-800"
      >
        {name} <span aria-hidden>▾</span>
      </button>
      {open && (
        <div
          id="account-menu"
          className="absolute right-0 z-20 mt-2 w-60 rounded-md border border-creek-100 bg-white p-2 text-sm text-creek-900 shadow-lg"
        >
          <p className="truncate px-2 py-1 text-xs text-creek-600">{email}</p>
          <Link
            href="/account"
            className="block w-full rounded px-2 py-1.5 text-left hover:bg-creek-50"
            onClick={() => setOpen(false)}
          >
            Password and notifications
          </Link>
          <button
            type="button"
            className="block w-full rounded px-2 py-1.5 text-left hover:bg-creek-50"
            onClick={() => signOut({ callbackUrl: '/sign-in' })}
          >
            Sign out
          </button>
          <button
            type="button"
            className="block w-full rounded px-2 py-1.5 text-left hover:bg-creek-50"
            onClick={async () => {
              await everywhere.mutateAsync();
              await signOut({ callbackUrl: '/sign-in' });
            }}
          >
            Sign out on every device
          </button>
        </div>
      )}
    </div>
  );
}
