// The compact input look of the editor's forms.
export const COMPACT_INPUT =
  'w-full rounded-md border border-paper-edge bg-white px-2 py-1 text-sm outline-none focus:border-pine-500 focus:ring-2 focus:ring-pine-100 disabled:bg-paper';
