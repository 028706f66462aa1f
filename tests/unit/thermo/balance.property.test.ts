import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { balanceEquation, checkBalance } from '@/lib/thermo/balance';
import { parseEquation } from '@/lib/thermo/equation';
import { ThermoError } from '@/lib/thermo/errors';

const POOL = ['H', 'C', 'N', 'O', 'S', 'Cl', 'Na', 'Fe'] as const;
type Counts = Record<string, number>;
interface Molecule {
  counts: Counts;
  charge: number;
}

const moleculeArb: fc.Arbitrary<Molecule> = fc.record({
  counts: fc
    .uniqueArray(fc.constantFrom(...POOL), { minLength: 1, maxLength: 3 })
    .chain((els) =>
      fc.tuple(...els.map(() => fc.integer({ min: 1, max: 4 }))).map((ns) => Object.fromEntries(els.map((e, i) => [e, ns[i]!]))),
    ),
  charge: fc.oneof({ weight: 3, arbitrary: fc.constant(0) }, { weight: 1, arbitrary: fc.integer({ min: -2, max: 2 }) }),
});
const sideArb = fc.array(fc.record({ molecule: moleculeArb, coefficient: fc.integer({ min: 1, max: 6 }) }), {
  minLength: 1,
  maxLength: 3,
});

// Sign-first with an explicit magnitude, so no charge is open to the trailing-digit rule.
function speciesText(m: Molecule): string {
  const formula = POOL.filter((e) => m.counts[e] !== undefined)
    .map((e) => (m.counts[e] === 1 ? e : `${e}${m.counts[e]}`))
    .join('');
  const charge = m.charge === 0 ? '' : `${m.charge > 0 ? '+' : '-'}${Math.abs(m.charge)}`;
  return `${formula}${charge}(${m.charge === 0 ? 'g' : 'aq'})`;
}

interface Reaction {
  left: Molecule[];
  right: Molecule[];
  /** A known balance, left then right. */
  vector: bigint[];
}

/** Closes two random sides with one extra species per side so that `vector` conserves everything. */
function close(left: { molecule: Molecule; coefficient: number }[], right: { molecule: Molecule; coefficient: number }[]): Reaction {
  const d: Counts = {};
  let dq = 0;
  for (const [terms, sign] of [[left, 1], [right, -1]] as const) {
    for (const { molecule, coefficient } of terms) {
      for (const [e, n] of Object.entries(molecule.counts)) d[e] = (d[e] ?? 0) + sign * coefficient * n;
      dq += sign * coefficient * molecule.charge;
    }
  }
  let extraRight: Counts = Object.fromEntries(Object.entries(d).filter(([, n]) => n > 0));
  let extraLeft: Counts = Object.fromEntries(Object.entries(d).filter(([, n]) => n < 0).map(([e, n]) => [e, -n]));
  const l = left.map((t) => t.molecule);
  const r = right.map((t) => t.molecule);
  const lv = left.map((t) => BigInt(t.coefficient));
  const rv = right.map((t) => BigInt(t.coefficient));
  const empty = (c: Counts): boolean => Object.keys(c).length === 0;
  if (empty(extraRight) && empty(extraLeft)) {
    if (dq === 0) return { left: l, right: r, vector: [...lv, ...rv] };
    // Only charge is off: an H on each side carries it.
    extraRight = { H: 1 };
    extraLeft = { H: 1 };
  }
  if (!empty(extraRight)) {
    r.push({ counts: extraRight, charge: dq });
    rv.push(1n);
  }
  if (!empty(extraLeft)) {
    l.push({ counts: extraLeft, charge: empty(extraRight) ? -dq : 0 });
    lv.push(1n);
  }
  return { left: l, right: r, vector: [...lv, ...rv] };
}

const reactionArb = fc.tuple(sideArb, sideArb).map(([l, r]) => close(l, r));

/** Rank by fraction-free integer elimination: a second method, independent of the balancer's. */
function rank(rows: bigint[][]): number {
  const m = rows.map((r) => r.slice());
  const cols = m[0]?.length ?? 0;
  let r = 0;
  for (let c = 0; c < cols && r < m.length; c++) {
    const p = m.findIndex((row, i) => i >= r && row[c] !== 0n);
    if (p < 0) continue;
    [m[r], m[p]] = [m[p]!, m[r]!];
    const pivot = m[r]!;
    for (let i = r + 1; i < m.length; i++) {
      const f = m[i]![c]!;
      if (f !== 0n) m[i] = m[i]!.map((x, j) => x * pivot[c]! - pivot[j]! * f);
    }
    r++;
  }
  return r;
}

function matrix(rx: Reaction): bigint[][] {
  const all = [...rx.left.map((m) => [m, 1n] as const), ...rx.right.map((m) => [m, -1n] as const)];
  const rows = POOL.map((e) => all.map(([m, s]) => s * BigInt(m.counts[e] ?? 0)));
  rows.push(all.map(([m, s]) => s * BigInt(m.charge)));
  return rows;
}

const gcd = (a: bigint, b: bigint): bigint => (b === 0n ? (a < 0n ? -a : a) : gcd(b, a % b));

describe('balanceEquation on random solvable reactions', () => {
  it('returns a balanced, smallest, positive result proportional to the known balance, or reports ambiguity truthfully', () => {
    let determinate = 0;
    fc.assert(
      fc.property(reactionArb, fc.boolean(), (rx, withNoise) => {
        // Coefficients in the text must be ignored, so half the cases carry arbitrary ones.
        const side = (ms: Molecule[]) => ms.map((m, i) => `${withNoise ? `${i + 2} ` : ''}${speciesText(m)}`).join(' + ');
        const eq = parseEquation(`${side(rx.left)} -> ${side(rx.right)}`);
        const rows = matrix(rx);
        // The generator's own claim: its vector conserves every element and the charge.
        for (const row of rows) expect(row.reduce((sum, x, i) => sum + x * rx.vector[i]!, 0n)).toBe(0n);
        const nullity = rx.vector.length - rank(rows);
        let out;
        try {
          out = balanceEquation(eq);
        } catch (err) {
          expect(err).toBeInstanceOf(ThermoError);
          expect((err as ThermoError).code).toBe('AMBIGUOUS_BALANCE');
          expect(nullity).toBeGreaterThan(1);
          return;
        }
        determinate++;
        expect(nullity).toBe(1);
        expect(checkBalance(out).isBalanced).toBe(true);
        const terms = [...out.reactants, ...out.products];
        expect(terms.map((t) => t.species.key)).toEqual([...eq.reactants, ...eq.products].map((t) => t.species.key));
        const c = terms.map((t) => {
          expect(t.coefficient.d).toBe(1n);
          expect(t.coefficient.s).toBe(1n);
          expect(t.coefficient.n > 0n).toBe(true);
          return t.coefficient.n;
        });
        expect(c.reduce(gcd, 0n)).toBe(1n);
        c.forEach((ci, i) => expect(ci * rx.vector[0]!).toBe(c[0]! * rx.vector[i]!));
      }),
      { numRuns: 400 },
    );
    // Guards against a generator that only ever yields ambiguous cases.
    expect(determinate).toBeGreaterThan(100);
  });
});
