// results.json keeps only figures that compare like with like: ratios and percentiles measured in the same run.
// Everything else a bench reports (counts, one-off timings, sizes, raw rates) goes to `context`.
export type Figures = Record<string, number>;

const COMPARABLE = /(_p\d+(_\d+)?_|_median_|_over_(?!\d)|_ratio_|_vs_)/;

export function isComparable(name: string): boolean {
  return COMPARABLE.test(`${name}_`);
}

// Ratios across sections of the same run, where both sides were measured.
function crossRatios(results: Record<string, Figures>): Figures {
  const out: Figures = {};
  const get = (section: string, key: string) => results[section]?.[key];
  const httpP95 = get('route endpoint (HTTP)', 'route200_saved_http_p95_ms');
  const inProcessP95 = get('route (in-process)', 'route_200_mixed_after_edit_p95_ms');
  if (httpP95 && inProcessP95) out.route200_p95_http_over_in_process = Math.round((httpP95 / inProcessP95) * 100) / 100;
  const small = get('engine', 'lookup_library_size_ns_per_op');
  const large = get('engine', 'lookup_10x_size_ns_per_op');
  if (small && large) out.species_lookup_10x_over_library_size = Math.round((large / small) * 100) / 100;
  // Engine µs per step inside a 200-step route against one step evaluated alone (the baseline).
  const stepUs = get('engine', 'shift_800K_conditions_median_us');
  const routeMedianMs = get('route (in-process)', 'route_200_downhill_median_ms');
  if (stepUs && routeMedianMs) out.route200_downhill_median_per_step_over_one_step_median = Math.round(((routeMedianMs * 1000) / 200 / stepUs) * 100) / 100;
  return out;
}

export function splitFigures(results: Record<string, Figures>): { results: Record<string, Figures>; context: Record<string, Figures> } {
  const kept: Record<string, Figures> = {};
  const context: Record<string, Figures> = {};
  for (const [section, figures] of Object.entries(results)) {
    for (const [name, value] of Object.entries(figures)) {
      const target = isComparable(name) ? kept : context;
      (target[section] ??= {})[name] = value;
    }
  }
  const cross = crossRatios(results);
  if (Object.keys(cross).length) kept['side by side'] = cross;
  return { results: kept, context };
}
