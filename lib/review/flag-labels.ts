import type { FlagCategory } from '../schemas/flag';

// What a flag's category is called wherever people read it (the flags tab, the approval dialog).
export const FLAG_CATEGORY_LABELS: Record<FlagCategory, string> = {
  thermodynamics: 'Thermodynamics',
  safety: 'Safety',
  cost: 'Cost',
  supply: 'Supply',
  other: 'Other',
};
