import type { Metadata, Viewport } from 'next';
import localFont from 'next/font/local';
import { headers } from 'next/headers';
import type { ReactNode } from 'react';
import { Providers } from '@/components/providers';
import './globals.css';

const runnelSans = localFont({
  src: '../fonts/inter-latin-wght-normal.woff2',
  variable: '--font-runnel',
  display: 'swap',
  weight: '100 900',
});

export const metadata: Metadata = {
  title: { default: 'Runnel', template: '%s · Runnel' },
  description: 'Plan gravity-fed and ram-pump water lines, from survey to upkeep.',
  manifest: '/manifest.webmanifest',
};

export const viewport: Viewport = { width: 'device-width', initialScale: 1 };

// Pages render per request: the Content Security Policy nonce (proxy.ts) is new every time, and a
// prerendered page would carry scripts without it.
export default async function RootLayout({ children }: { children: ReactNode }) {
  await headers();
  return (
    <html lang="en" className={runnelSans.variable}>
      <body className="min-h-screen font-sans">
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
