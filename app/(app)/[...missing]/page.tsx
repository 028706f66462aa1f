import { notFound } from 'next/navigation';

// Any address no page serves: answered inside the signed-in shell (app/(app)/not-found.tsx) rather than on a bare page.
export default function MissingPage(): never {
  notFound();
}
