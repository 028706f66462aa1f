import Link from 'next/link';
import { StepwellMark } from '@/components/shell/stepwell-mark';

const POINTS = [
  {
    title: 'Every step at its own conditions',
    body: 'ΔG° from tabulated formation data or integrated heat capacities, then ΔG = ΔG° + RT ln Q at the temperature, pressures and concentrations you actually plan.',
  },
  {
    title: 'See where the route climbs',
    body: 'A cumulative free-energy ladder per mole of target shows at a glance which steps are uphill, which are marginal, and how far each one goes (K and the equilibrium composition).',
  },
  {
    title: 'What would make it go',
    body: 'For an uphill step: the crossover temperature, the excess or product removal that tips Q, or a strongly downhill reaction to couple through a shared intermediate.',
  },
  {
    title: 'Decide as a group',
    body: 'Colleagues comment on and flag weak steps; the group lead compares alternative routes side by side and records the decision with its reasons.',
  },
];

export default function LandingPage() {
  return (
    <main className="mx-auto max-w-5xl px-6 py-10">
      <nav className="flex items-center justify-between">
        <span className="flex items-center gap-2 text-lg font-semibold">
          <StepwellMark /> Stepwell
        </span>
        <span className="flex gap-3 text-sm">
          <Link href="/sign-in" className="rounded-md px-3 py-1.5 text-pine-700 hover:bg-pine-50">
            Sign in
          </Link>
          <Link href="/sign-up" className="rounded-md bg-pine-600 px-3 py-1.5 font-medium text-white hover:bg-pine-700">
            Start a team
          </Link>
        </span>
      </nav>
      <section className="mt-14 max-w-3xl">
        <h1 className="text-3xl font-semibold leading-tight tracking-tight">
          Know which steps of a synthesis route will run downhill, before you spend bench time on them.
        </h1>
        <p className="mt-4 text-base text-ink-soft">
          Stepwell is for process chemists, chemical engineers and biocatalysis teams who plan routes from feedstocks to a target. Lay the
          steps out on a board, link them through their intermediates, and the server evaluates each one with sourced thermodynamic data.
        </p>
      </section>
      <section className="mt-10 grid gap-4 sm:grid-cols-2">
        {POINTS.map((p) => (
          <article key={p.title} className="rounded-lg border border-paper-edge bg-white p-4">
            <h2 className="font-semibold text-pine-700">{p.title}</h2>
            <p className="mt-1 text-sm text-ink-soft">{p.body}</p>
          </article>
        ))}
      </section>
      <p className="mt-10 max-w-3xl border-l-4 border-brass-500 pl-3 text-xs text-ink-soft">
        A thermodynamic screen says nothing about rates, selectivity, runaway potential or toxicity. Strongly exothermic or gas-evolving steps
        need a process-safety assessment by qualified people under your local codes before any scale-up.
      </p>
    </main>
  );
}
