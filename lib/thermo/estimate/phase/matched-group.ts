// What every estimate in this folder reports about the groups it used, so a user can see where each
// number came from.

export interface MatchedGroup {
  /** the group's name as the source table writes it */
  label: string;
  /** how many times it occurs in the molecule */
  count: number;
  /** table and paper the values come from */
  source: string;
  /** 0-based heavy-atom indices of each occurrence (RDKit order of the input SMILES) */
  atoms?: number[][];
}
