import { Notice } from '@/components/ui/notice';

// Shown wherever routes are judged (the editor, the comparison, the report): the screen's limits, in plain words.
export function SafetyCaution() {
  return (
    <Notice tone="caution" title="A thermodynamic screen only">
      Stepwell shows whether each step can run downhill in free energy at the conditions you enter. It says nothing about rates, selectivity,
      toxicity or hazards. Strongly exothermic or gas-evolving steps need a process-safety assessment (calorimetry, relief sizing) by qualified
      people under your local codes before anyone runs them.
    </Notice>
  );
}
