// A long chain for benchmarks: NO is oxidised and the NO2 split back, again and again, each step
// feeding the next. Every step has a temperature of its own (400–700 K), so no two steps share
// remedies; the splits are uphill at these temperatures, the oxidations downhill.
export function syntheticChain(length: number, temperatureShift_K = 0) {
  const steps = Array.from({ length }, (_, i) => ({
    id: `s${i + 1}`,
    equation: i % 2 === 0 ? '2 NO(g) + O2(g) -> 2 NO2(g)' : '2 NO2(g) -> 2 NO(g) + O2(g)',
    temperature: `${(400 + ((i * 1.5) % 300) + temperatureShift_K).toFixed(3)} K`,
    yieldPct: 99,
    notes: '',
    position: { x: (i % 20) * 260, y: Math.floor(i / 20) * 160 },
  }));
  const links = steps.slice(1).map((s, i) => ({ from: steps[i]!.id, to: s.id, species: i % 2 === 0 ? 'NO2(g)' : 'NO(g)' }));
  const target = length % 2 === 1 ? 'NO2(g)' : 'NO(g)';
  return { target, steps, links };
}
