// The thermo CLI as a user runs it: JSON on stdin, pretty JSON on stdout, exit codes.
import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const ROOT = path.resolve(__dirname, '../../..');
const TSX = path.join(ROOT, 'node_modules/.bin/tsx');

function run(args: string[], stdin: string): { status: number | null; stdout: string; stderr: string } {
  const r = spawnSync(TSX, ['scripts/thermo.ts', ...args], { cwd: ROOT, input: stdin, encoding: 'utf8', timeout: 60000 });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

describe('thermo CLI', () => {
  it('evaluates a single request (NBS 1982: ΔfG°(H2O,l) = −237.129 kJ/mol)', () => {
    const r = run(['evaluate'], JSON.stringify({ equation: 'H2(g) + 1/2 O2(g) -> H2O(l)', temperature: '25 degC' }));
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout) as { deltaG0_kJ: number; equation: string };
    expect(out.deltaG0_kJ).toBe(-237.129);
    expect(out.equation).toBe('H2(g) + 1/2 O2(g) ⇌ H2O(l)');
    expect(r.stdout).toContain('\n  "'); // pretty-printed
  });

  it('answers an array item by item, a failing item as an error in its place', () => {
    const items = [
      { equation: 'N2(g) + 3 H2(g) -> 2 NH3(g)' },
      { equation: 'H2(g) + O2(g) -> H2O(l)' },
      { equation: 'N2(g) + 3 H2(g) -> 2 NH3(g)', temperature: 300 },
      { equation: 'N2(g) + 3 H2(g) -> 2 NH3(g)', colour: 'blue' },
    ];
    const r = run(['evaluate'], JSON.stringify(items));
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout) as { deltaG0_kJ?: number; error?: { code: string; field: string; message: string } }[];
    expect(out).toHaveLength(4);
    // 2 ΔfG°(NH3, g): NBS 1982 −16.45 kJ/mol shifted by ATcT 1.112's newer ΔfH° (−45.558 against −46.11), the CLI's library.
    expect(out[0]!.deltaG0_kJ).toBeCloseTo(2 * (-16.45 + (-45.558 + 46.11)), 6);
    expect(out[1]!.error).toMatchObject({ code: 'UNBALANCED', field: 'equation' });
    expect(out[2]!.error).toMatchObject({ code: 'VALIDATION', field: 'temperature' });
    expect(out[3]!.error).toMatchObject({ code: 'VALIDATION', field: 'colour' });
  });

  it('exits 2 with a message on stderr when stdin is not JSON', () => {
    const r = run(['evaluate'], 'not json {');
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/not JSON/);
    expect(r.stdout).toBe('');
  });

  it('exits 2 with usage for an unknown subcommand', () => {
    const r = run(['plot'], '{}');
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/usage:/);
  });

  it('fits ln K against 1/T', () => {
    // points from ΔH° = −50 kJ/mol, ΔS° = −100 J/(mol K) with R = 8.314462618
    const lnK = (T: number): number => 50000 / (8.314462618 * T) - 100 / 8.314462618;
    const request = { points: [300, 400, 500, 600].map((T) => ({ temperature: `${T} K`, lnK: lnK(T) })), predictAt: ['450 K'] };
    const r = run(['fit'], JSON.stringify(request));
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout) as { deltaH0_kJ: number; deltaS0_J_per_K: number; predictions: { lnK: number }[] };
    expect(out.deltaH0_kJ).toBeCloseTo(-50, 9);
    expect(out.deltaS0_J_per_K).toBeCloseTo(-100, 8);
    expect(out.predictions[0]!.lnK).toBeCloseTo(lnK(450), 9);
  });

  it('reports a fit with too few points as INVALID_VALUE', () => {
    const r = run(['fit'], JSON.stringify({ points: [{ temperature: '300 K', K: 2 }] }));
    expect(r.status).toBe(0);
    expect((JSON.parse(r.stdout) as { error: { code: string } }).error.code).toBe('INVALID_VALUE');
  });

  it('evaluates a route: the ladder ends at the sum of scaled step ΔG°; a cycle withholds the totals, not the steps', () => {
    const route = {
      target: 'CH3OH(g)',
      steps: [
        { id: 's1', equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)', temperature: '700 K' },
        { id: 's2', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', temperature: '500 K' },
      ],
      links: [{ from: 's1', to: 's2', species: 'CO(g)' }],
    };
    const cyclic = { ...route, links: [...route.links, { from: 's2', to: 's1', species: 'CH3OH(g)' }] };
    const r = run(['route'], JSON.stringify([route, cyclic]));
    expect(r.status).toBe(0);
    const [ok, bad] = JSON.parse(r.stdout) as [
      { order: string[]; steps: { deltaG0_kJ: number; cumulative0_kJ: number; class: string }[]; overall: { deltaG0_kJ: number } },
      { steps: { class: string }[]; totalsWithheld: { code: string; message: string } },
    ];
    expect(ok.order).toEqual(['s1', 's2']);
    expect(ok.steps[0]!.class).toBe('uphill'); // steam reforming is uphill below ~890 K at 1 bar
    expect(ok.steps[1]!.cumulative0_kJ).toBeCloseTo(ok.steps[0]!.deltaG0_kJ + ok.steps[1]!.deltaG0_kJ, 9);
    expect(ok.overall.deltaG0_kJ).toBeCloseTo(ok.steps[1]!.cumulative0_kJ, 9);
    expect(bad.totalsWithheld.message).toMatch(/s1/);
    expect(bad.steps.map((s) => s.class)).toEqual(['uphill', ok.steps[1]!.class]);
  });

  it('answers the species command array-in, array-out: a library species with its source, an estimate with its groups, an error in place', () => {
    const r = run(['species'], JSON.stringify([
      { name: 'aniline', phase: 'l' },
      { smiles: 'O=C(OC(C)(C)C)N1CCCC1', phase: 'g', temperature: '400 K' },
      { smiles: 'C1CC', phase: 'g' },
    ]));
    expect(r.status).toBe(0);
    const [aniline, boc, bad] = JSON.parse(r.stdout) as Record<string, unknown>[];
    // NIST WebBook: ΔfH°(aniline, l) = 31.142 kJ/mol (organic library row).
    expect(aniline).toMatchObject({ origin: 'library', inchikey: 'PAYRUJLWNCNPSJ-UHFFFAOYSA-N', formula: 'C6H7N', phase: 'l', temperature_K: 298.15 });
    expect(aniline!.dfH_kJ).toBeCloseTo(31.142, 3);
    expect(aniline!.source).toMatch(/WebBook/);
    expect(boc).toMatchObject({ origin: 'estimated', phase: 'g', temperature_K: 400 });
    expect((boc!.groups as unknown[]).length).toBeGreaterThan(3);
    expect(boc!.method).toMatch(/group additivity/);
    for (const field of ['smiles', 'inchikey', 'formula', 'charge', 'name', 'dfH_kJ', 'dfG_kJ', 'S_J_per_K', 'Cp_J_per_K', 'sigma_dfH_kJ', 'sigma_dfG_kJ', 'cpRange_K']) expect(boc, field).toHaveProperty(field);
    expect(bad).toMatchObject({ error: { code: 'INVALID_STRUCTURE', field: 'smiles' } });
  });

  it('evaluates route steps with species maps, estimating what no table has', () => {
    const r = run(['route'], JSON.stringify({
      target: 'alcohol',
      species: { alcohol: { smiles: 'CC(O)c1ccc(F)cc1', phase: 'l' } },
      steps: [{ id: 'reduce', equation: 'ketone + IPA -> alcohol + acetone(l)', species: { ketone: { smiles: 'CC(=O)c1ccc(F)cc1', phase: 'l' }, IPA: { name: 'isopropanol', phase: 'l' } } }],
    }));
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout) as { error?: unknown; steps?: { result: { species: { as_written: string; origin: string }[] } | null; error: unknown }[] };
    expect(out.error ?? out.steps![0]!.error ?? null).toBeNull();
    const origins = Object.fromEntries(out.steps![0]!.result!.species.map((s) => [s.as_written, s.origin]));
    expect(origins).toEqual({ ketone: 'estimated', IPA: 'library', alcohol: 'estimated', 'acetone(l)': 'library' });
  });
});
