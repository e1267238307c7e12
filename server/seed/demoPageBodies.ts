import type { ReagentRow } from '../../shared/editor';
import type { PageBlock } from './pageDocument';

/**
 * Bodies of the demo pages in the invented Saltmarsh Lane flavour-ester scenario. Quantities,
 * observations and results are made up. Hazard notes stand for what a chemist would type; they
 * are illustrative demo text (kept to the well-known classifications of these substances), not
 * safety data, and every reagent list says so.
 */
export interface DemoBody {
  notebook: string;
  number: number;
  /** Gets the page's attached files (name → id) to embed a spectrum in the text. */
  blocks: (files: Map<string, string>) => PageBlock[];
}

const DEMO_HAZARD_NOTE = '(illustrative demo note)';
const demoHazards = (text: string) => `${text} ${DEMO_HAZARD_NOTE}`;

const demoNotice: PageBlock = {
  text: 'Demo page: the hazard notes in the reagent list are illustrative text written for the demo. Always read the supplier’s safety data sheet and follow local rules.',
};

/** One demo experiment, section by section. */
interface DemoRecord {
  aim: string;
  structures: { smiles: string; label: string }[];
  /** Hazard notes as a chemist would type them; each gets the illustrative-demo marker. */
  reagents: Omit<ReagentRow, 'rowKey'>[];
  steps: string[];
  observations: string;
  /** Blocks after the observations, e.g. an embedded spectrum. */
  evidence?: PageBlock[];
  result: string;
}

/** The layout every demo page shares: aim with its structures, reagents under the demo notice, procedure, observations, result. */
function experimentBlocks(record: DemoRecord): PageBlock[] {
  return [
    { heading: 'Aim' },
    { text: record.aim },
    ...record.structures.map((structure) => ({ structure })),
    { heading: 'Reagents' },
    demoNotice,
    { reagents: record.reagents.map((row) => ({ ...row, hazards: demoHazards(row.hazards) })) },
    { heading: 'Procedure' },
    { steps: record.steps },
    { heading: 'Observations' },
    { text: record.observations },
    ...(record.evidence ?? []),
    { heading: 'Result' },
    { text: record.result },
  ];
}

const FRUITY = 'Fruity esters from short-chain acids';
const CHECKS = 'Solvent and reagent checks';

export const demoBodies: DemoBody[] = [
  {
    notebook: FRUITY,
    number: 1,
    blocks: (files) =>
      experimentBlocks({
        aim: 'Prepare a first 0.1 mol batch of isoamyl acetate (3-methylbutyl acetate), the banana note of the spring range, by acid-catalysed esterification of 3-methylbutan-1-ol with excess acetic acid.',
        structures: [
          { smiles: 'CC(C)CCO', label: 'compound 1' },
          { smiles: 'CC(O)=O', label: 'compound 2' },
          { smiles: 'CC(=O)OCCC(C)C', label: 'compound 3 (product)' },
        ],
        reagents: [
          { name: '3-methylbutan-1-ol', smiles: 'CC(C)CCO', amount: '8.82', unit: 'g', equivalents: '1.0', hazards: 'H226 flammable liquid and vapour; irritating to eyes and airways.' },
          { name: 'acetic acid, glacial', smiles: 'CC(O)=O', amount: '12.0', unit: 'g', equivalents: '2.0', hazards: 'H226 flammable; H314 causes severe skin burns and eye damage.' },
          { name: 'sulfuric acid, concentrated (catalyst)', smiles: 'OS(=O)(=O)O', amount: '0.5', unit: 'mL', equivalents: '', hazards: 'H314 causes severe skin burns and eye damage; add slowly, with cooling.' },
          { name: 'sodium hydrogen carbonate, saturated aqueous', smiles: '', amount: '2 × 25', unit: 'mL', equivalents: '', hazards: 'Gas (carbon dioxide) forms on contact with acid: vent the separating funnel often.' },
        ],
        steps: [
          'Charged a 100 mL round-bottomed flask with 3-methylbutan-1-ol (8.82 g, 100 mmol) and glacial acetic acid (12.0 g, 200 mmol).',
          'Added concentrated sulfuric acid (0.5 mL) dropwise with swirling in a water bath; added two anti-bumping granules.',
          'Heated under reflux for 60 min, then cooled to room temperature.',
          'Poured onto 50 mL cold water; separated the upper organic layer and washed it with saturated sodium hydrogen carbonate (2 × 25 mL) until no more gas formed, then with 25 mL water.',
          'Dried over anhydrous magnesium sulfate, filtered and distilled; collected the fraction boiling at 138–142 °C.',
        ],
        observations: 'The mixture darkened slightly to pale straw during reflux. Strong pear-drop and banana odour after the bicarbonate wash; both washes gave steady gas evolution. Distillate clear and colourless.',
        evidence: files.has('isoamyl-acetate-crude-IR.jdx')
          ? [
              { text: 'IR of the crude product (attached): strong ester C=O band near 1740 cm⁻¹ and C–O band near 1240 cm⁻¹; only a weak broad O–H band remains.' },
              { attachment: { attachmentId: files.get('isoamyl-acetate-crude-IR.jdx')!, linkedLabel: 'compound 3 (product)' } },
            ]
          : [],
        result: 'Isoamyl acetate (compound 3): 10.4 g (79.9 mmol), 80 % yield based on 3-methylbutan-1-ol; colourless liquid, b.p. 138–142 °C.',
      }),
  },
  {
    notebook: FRUITY,
    number: 2,
    blocks: () =>
      experimentBlocks({
        aim: 'Ethyl butanoate (pineapple note) from butanoic acid and ethanol, removing the water formed with toluene in a water separator to push the equilibrium towards the ester.',
        structures: [
          { smiles: 'CCCC(O)=O', label: 'compound 4' },
          { smiles: 'CCO', label: 'compound 5' },
          { smiles: 'Cc1ccccc1', label: 'solvent' },
          { smiles: 'CCCC(=O)OCC', label: 'compound 6 (product)' },
        ],
        reagents: [
          { name: 'butanoic acid', smiles: 'CCCC(O)=O', amount: '8.81', unit: 'g', equivalents: '1.0', hazards: 'H314 causes severe skin burns and eye damage; strong rancid odour, fume cupboard only.' },
          { name: 'ethanol, absolute', smiles: 'CCO', amount: '13.8', unit: 'g', equivalents: '3.0', hazards: 'H225 highly flammable liquid and vapour; H319 eye irritation.' },
          { name: 'toluene', smiles: 'Cc1ccccc1', amount: '40', unit: 'mL', equivalents: '', hazards: 'H225 highly flammable; H304 may be fatal if swallowed and enters airways; H361d suspected of damaging the unborn child.' },
          { name: 'sulfuric acid, concentrated (catalyst)', smiles: 'OS(=O)(=O)O', amount: '0.3', unit: 'mL', equivalents: '', hazards: 'H314 causes severe skin burns and eye damage.' },
        ],
        steps: [
          'Combined butanoic acid (8.81 g, 100 mmol), ethanol (13.8 g, 300 mmol) and toluene (40 mL) in a 250 mL flask fitted with a water separator and condenser.',
          'Added concentrated sulfuric acid (0.3 mL) and heated to reflux for 3 h, draining the lower layer of the separator twice.',
          'Cooled, washed with water (30 mL), saturated sodium hydrogen carbonate (2 × 30 mL) and brine (30 mL); dried over magnesium sulfate.',
          'Removed toluene and excess ethanol by fractional distillation; collected ethyl butanoate at 119–122 °C.',
        ],
        observations: 'About 1.6 mL of lower aqueous phase collected in the separator (water and some ethanol). Product has a clean pineapple odour; no butanoic acid odour after the bicarbonate washes.',
        result: 'Ethyl butanoate (compound 6): 8.6 g (74.0 mmol), 74 % yield based on butanoic acid; colourless liquid.',
      }),
  },
  {
    notebook: FRUITY,
    number: 3,
    blocks: () =>
      experimentBlocks({
        aim: 'Compare two work-ups of crude isoamyl acetate: brine washes only (batch A) against a sodium hydrogen carbonate wash before brine (batch B), looking at recovery and residual acetic acid.',
        structures: [
          { smiles: 'CC(=O)OCCC(C)C', label: 'compound 3' },
          { smiles: 'CC(O)=O', label: 'acid to remove' },
        ],
        reagents: [
          { name: 'crude isoamyl acetate (from page 001)', smiles: 'CC(=O)OCCC(C)C', amount: '2 × 6.5', unit: 'g', equivalents: '', hazards: 'H226 flammable liquid and vapour; contains acetic and sulfuric acid residues.' },
          { name: 'sodium hydrogen carbonate, saturated aqueous', smiles: '', amount: '2 × 15', unit: 'mL', equivalents: '', hazards: 'Carbon dioxide forms with acid: vent the funnel often.' },
          { name: 'brine (saturated sodium chloride)', smiles: '', amount: '4 × 15', unit: 'mL', equivalents: '', hazards: 'No particular hazard noted.' },
        ],
        steps: [
          'Split 13.0 g of crude ester into two 6.5 g portions, A and B.',
          'A: washed with brine (2 × 15 mL). B: washed with saturated sodium hydrogen carbonate (2 × 15 mL), then brine (2 × 15 mL).',
          'Dried both over magnesium sulfate, filtered, weighed, and checked a drop of each on wet pH paper.',
        ],
        observations: 'A: wet pH paper turned red (about pH 3); faint vinegar odour. B: vigorous gas evolution in the first bicarbonate wash; pH paper about 6; no vinegar odour.',
        result: 'Recovery A 6.1 g (94 %), B 5.8 g (89 %). The bicarbonate wash costs about 5 % of the ester but removes the remaining acid; batch B work-up kept for the spring range.',
      }),
  },
  {
    notebook: CHECKS,
    number: 1,
    blocks: () =>
      experimentBlocks({
        aim: 'Water content of incoming toluene lot 24-117 before it is used as the entrainer in the ester preparations (acceptance: at most 50 ppm).',
        structures: [
          { smiles: 'Cc1ccccc1', label: 'toluene' },
        ],
        reagents: [
          { name: 'toluene, lot 24-117', smiles: 'Cc1ccccc1', amount: '3 × 5.0', unit: 'mL', equivalents: '', hazards: 'H225 highly flammable; H304; H315; H336 may cause drowsiness; H361d; H373.' },
          { name: 'coulometric titration reagent (commercial)', smiles: '', amount: '100', unit: 'mL', equivalents: '', hazards: 'Mixture: hazards as stated on its own safety data sheet; not repeated here.' },
        ],
        steps: [
          'Conditioned the coulometric cell until the drift was below 10 µg/min.',
          'Injected three 5.0 mL portions of the lot through the septum with a dry syringe, weighing the syringe before and after each injection.',
          'Recorded the water found for each injection and the mass injected.',
        ],
        observations: 'Injections: 4.33 g → 165 µg water; 4.35 g → 178 µg; 4.31 g → 172 µg. Drift stable at 4–6 µg/min throughout.',
        result: 'Water content 40 ppm (mean of three; 38, 41, 40 ppm). Within the 50 ppm limit: lot 24-117 accepted for use.',
      }),
  },
  {
    notebook: CHECKS,
    number: 2,
    blocks: () =>
      experimentBlocks({
        aim: 'A reference IR spectrum of the group’s hexane, to recognise hexane left in products after chromatography.',
        structures: [
          { smiles: 'CCCCCC', label: 'hexane' },
        ],
        reagents: [
          { name: 'hexane', smiles: 'CCCCCC', amount: '1', unit: 'drops', equivalents: '', hazards: 'H225 highly flammable; H304; H315; H336; H361f; H373; H411 toxic to aquatic life.' },
        ],
        steps: [
          'Recorded the background on the clean diamond ATR crystal.',
          'Placed one drop of hexane on the crystal and recorded 16 scans from 4000 to 600 cm⁻¹ before it evaporated.',
          'Cleaned the crystal with a dry tissue.',
        ],
        observations: 'Only C–H bands: stretching between 2960 and 2850 cm⁻¹, bending near 1465 and 1380 cm⁻¹, and a weak rocking band near 725 cm⁻¹. No O–H or C=O bands.',
        result: 'Reference spectrum recorded; to be attached once exported from the instrument.',
      }),
  },
];
