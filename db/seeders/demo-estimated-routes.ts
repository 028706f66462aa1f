// Two invented demo routes that rest on estimated values: species named as the identifier table knows them or given
// by SMILES under short labels, every organic the published tables lack estimated by group contribution, so the board
// shows its estimate marks and σ.
// Conditions were checked with `npm run -s thermo -- route`; the notes say what the screen cannot.
import type { LinkInput, StepInput } from '../../lib/schemas/route';

export interface DemoRoutePlan {
  name: string;
  target: string;
  steps: StepInput[];
  links: LinkInput[];
}

// Every species a table names is written by that name (the labels are short handles for the equations), so a designer
// finds each one by the same name in "Add species"; only the Boc carbamate, which no table has, is given by structure.
const PPD = { name: 'p-phenylenediamine', phase: 'l' } as const;
const AC_PPD = { name: "4'-aminoacetanilide", phase: 'l' } as const;
const BOC_AC_PPD = { smiles: 'CC(=O)Nc1ccc(NC(=O)OC(C)(C)C)cc1', phase: 'l', name: 'tert-butyl N-(4-acetamidophenyl)carbamate' } as const;

const LIQUID_NOTE = 'Pure-liquid values stand in for the solution (a subcooled melt where the pure compound is a solid).';

export const BOC_BUILDING_BLOCK: DemoRoutePlan = {
  name: 'KR-117 building block: nitro reduction, amide, Boc (estimated values)',
  target: 'BocAcPPD',
  steps: [
    {
      id: 'reduce',
      equation: 'PNA + 3 H2(g) -> PPD + 2 H2O(l)',
      species: { PNA: { name: '4-nitroaniline', phase: 'l' }, PPD },
      temperature: '323.15 K',
      pressures: { 'H2(g)': '5 bar' },
      yieldPct: 97,
      notes: [
        '4-Nitroaniline (PNA) to p-phenylenediamine (PPD) over Pd/C at 5 bar H2 in methanol, 50 °C.',
        'Nitro reductions are strongly exothermic: hydrogen dosing, cooling and the accumulation of intermediates need a process-safety assessment (reaction calorimetry) before any scale-up. p-Phenylenediamine is a strong skin sensitiser.',
        `Both organics are estimated (group additivity, then vaporisation); the nitro compound carries the largest σ of the route. ${LIQUID_NOTE}`,
      ].join('\n'),
      position: { x: 0, y: 0 },
    },
    {
      id: 'amide',
      equation: 'PPD + AcOH -> AcPPD + H2O(g)',
      species: { PPD, AcOH: { name: 'acetic acid', phase: 'l' }, AcPPD: AC_PPD },
      temperature: '384 K',
      pressures: { 'H2O(g)': '0.1 bar' },
      yieldPct: 90,
      notes: [
        "Direct amidation of p-phenylenediamine with acetic acid to 4'-aminoacetanilide (AcPPD) in refluxing toluene; a Dean–Stark trap takes the water off (modelled as 0.1 bar of water vapour).",
        'Mono- against diacetylation is a matter of rates and selectivity, which a thermodynamic screen cannot judge.',
        `PPD and AcPPD are estimated; acetic acid is tabulated. ${LIQUID_NOTE}`,
      ].join('\n'),
      position: { x: 360, y: 0 },
    },
    {
      id: 'boc',
      equation: 'AcPPD + Boc2O -> BocAcPPD + tBuOH + CO2(g)',
      species: {
        AcPPD: AC_PPD,
        Boc2O: { name: 'di-tert-butyl dicarbonate', phase: 'l' },
        tBuOH: { name: 'tert-butanol', phase: 'l' },
        BocAcPPD: BOC_AC_PPD,
      },
      temperature: '313.15 K',
      pressures: { 'CO2(g)': '1 bar' },
      yieldPct: 95,
      notes: [
        'Boc protection of the free aryl amine of AcPPD with di-tert-butyl dicarbonate (Boc2O) in ethanol at 40 °C, to the carbamate BocAcPPD.',
        'Releases one mol of CO2 per mol, and Boc anhydride and Boc groups can give isobutylene on heating: gas evolution, venting and flammability need a process-safety assessment.',
        `The carbamate is in no table, so it is given by its structure; it, AcPPD and Boc2O are estimated; tert-butanol and CO2 are tabulated. ${LIQUID_NOTE}`,
      ].join('\n'),
      position: { x: 720, y: 0 },
    },
  ],
  links: [
    { from: 'reduce', to: 'amide', species: 'PPD' },
    { from: 'amide', to: 'boc', species: 'AcPPD' },
  ],
};

const aq = (smiles: string) => ({ smiles, phase: 'aq' }) as const;

export const KRED_REDUCTION: DemoRoutePlan = {
  name: '(S)-1-Phenylethanol by ketoreductase, isopropanol-coupled (estimated values)',
  target: 'S-alcohol',
  steps: [
    {
      id: 'kred',
      equation: 'ketone + iPrOH -> S-alcohol + acetone',
      species: { ketone: aq('CC(=O)c1ccccc1'), iPrOH: aq('CC(C)O'), 'S-alcohol': aq('C[C@H](O)c1ccccc1'), acetone: aq('CC(C)=O') },
      temperature: '303.15 K',
      concentrations: { ketone: '10 mmol/L', iPrOH: '1.3 mol/L', 'S-alcohol': '90 mmol/L', acetone: '90 mmol/L' },
      yieldPct: 90,
      notes: [
        'Acetophenone to (S)-1-phenylethanol by a ketoreductase in pH 7 buffer at 30 °C; the enzyme recycles NADPH by oxidising isopropanol to acetone.',
        'The equation is the net of the cofactor cycle: phosphate cofactors (NADP+/NADPH) cannot be estimated, so they are left out.',
        'Conditions are taken at 90 % conversion (10 mmol/L ketone left, 1.3 mol/L isopropanol). ΔG° lies within its σ of zero: the data cannot say which way the step runs, which is why isopropanol is used in excess.',
        'Removing acetone as it forms (nitrogen sweep or reduced pressure) pulls the equilibrium toward the alcohol. Isopropanol and acetone are flammable: stripping them needs a process-safety assessment.',
        'All four solutes are estimated (group additivity, then hydration); stereoisomers share their estimated values.',
      ].join('\n'),
      position: { x: 0, y: 0 },
    },
  ],
  links: [],
};
