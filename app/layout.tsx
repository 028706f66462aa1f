import type { Metadata } from 'next';
import localFont from 'next/font/local';
import { connection } from 'next/server';
import type { ReactNode } from 'react';
import { Providers } from './providers';
import './globals.css';

const body = localFont({ src: './fonts/inter-latin-wght.woff2', weight: '100 900', variable: '--font-body', display: 'swap' });
// A separate family used only as fallback, so Δ and other Greek letters come from the same design.
const greek = localFont({ src: './fonts/inter-greek-wght.woff2', weight: '100 900', variable: '--font-greek', display: 'swap', preload: false });

export const metadata: Metadata = {
  title: { default: 'Stepwell', template: '%s · Stepwell' },
  description: 'Free-energy screening of multi-step synthesis routes, step by step, at your own conditions.',
};

export default async function RootLayout({ children }: { children: ReactNode }) {
  // Rendered per request, never prerendered: the CSP nonce from proxy.ts exists only at request time.
  await connection();
  return (
    <html lang="en" className={`${body.variable} ${greek.variable}`}>
      <body className="min-h-screen bg-paper font-sans text-ink antialiased">
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
