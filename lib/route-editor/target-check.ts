// Whether a new route's target names a species the engine can read, asked of the live balance check with the
// identity "X -> X", which reads species exactly as a route's target is read (names, phases, the team's species).
// Pure: the dialog passes the check's answer in.
import type { BalanceCheck } from '../services/thermo/check-equation-balance';

export type BalanceAnswerLike = BalanceCheck | { error: { code: string; message: string; position: number | null } };

/** The identity equation whose species is the target, or null when there is nothing to check yet. */
export function targetProbe(target: string): string | null {
  const text = target.trim();
  // An arrow or a plus in the target would make the probe a different equation: the schema refuses those anyway.
  if (!text || /->|→|=|\s\+\s/.test(text)) return null;
  return `${text} -> ${text}`;
}

/** What the target field says about the answer, or null when the target is a species the library has. */
export function targetProblem(target: string, answer: BalanceAnswerLike | undefined): string | null {
  if (!answer) return null;
  if ('error' in answer) {
    // The parser names positions in the probe; the person typed only the target.
    const message = answer.error.message.replace(/ at position \d+(?: in "[^"]*")?/, '').replace(/ in "[^"]*"$/, '');
    return `${target.trim()} cannot be read as a species: ${message}. Write a formula or name with its phase, e.g. CH3OH(g) or ethanol(l).`;
  }
  const unknown = answer.unknownSpecies ?? [];
  return unknown.length > 0 ? answer.message.replace(/^Balanced, but /, '') : null;
}
