import type { Metadata } from 'next';
import localFont from 'next/font/local';
import type { ReactNode } from 'react';
import { Providers } from './providers';
import './globals.css';

// Latin and Greek subsets, so ΔG° renders in the same face.
const body = localFont({
  src: [
    { path: './fonts/inter-latin-wght.woff2', weight: '100 900', style: 'normal' },
    { path: './fonts/inter-greek-wght.woff2', weight: '100 900', style: 'normal' },
  ],
  variable: '--font-body',
  display: 'swap',
});

export const metadata: Metadata = {
  title: { default: 'Stepwell', template: '%s · Stepwell' },
  description: 'Free-energy screening of multi-step synthesis routes, step by step, at your own conditions.',
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={body.variable}>
      <body className="min-h-screen bg-paper font-sans text-ink antialiased">
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
