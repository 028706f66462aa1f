import Link from 'next/link';

export default function NotFound() {
  return (
    <main className="mx-auto max-w-lg px-4 py-16 text-center">
      <h1 className="text-xl font-semibold">Not found</h1>
      <p className="mt-2 text-sm text-ink-soft">There is nothing here, or you do not have access to it.</p>
      <Link href="/routes" className="mt-4 inline-block text-pine-700 underline">
        Back to routes
      </Link>
    </main>
  );
}
