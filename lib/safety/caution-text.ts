// The caution's words, kept in one place so the page, the printed reports and exported files say the same thing.
export const CAUTION_TITLE = 'A thermodynamic screen only';

export const CAUTION_FULL =
  'Stepwell shows whether each step can run downhill in free energy at the conditions you enter. It says nothing about rates, selectivity, ' +
  'toxicity or hazards. Strongly exothermic or gas-evolving steps need a process-safety assessment (calorimetry, relief sizing) by qualified ' +
  'people under your local codes before anyone runs them.';

/** One line: what stays visible once the full caution is folded, and what heads exported files. */
export const CAUTION_SHORT = 'Thermodynamic screen only: it says nothing of rates, runaway, selectivity or toxicity. Get a process-safety assessment before any work at the bench.';
