import { parseFormula } from '@ionfolio/chem';
import { demoTextHash } from './demo-random';

/** What a compound is to the invented plant: what it buys, makes on the way, finds as a by-product, or uses. */
export type DemoRole = 'raw material' | 'intermediate' | 'impurity' | 'solvent' | 'derivative';

/** A column class of the demo retention indices. */
export type DemoColumnClass = 'non-polar' | 'polar';

/**
 * One compound of the demo library of the invented Quillmere Aroma Chemicals QC laboratory.
 * Name, formula and SMILES are facts of chemistry; role, synonyms chosen and retention index are
 * demo content.
 */
export interface DemoCompound {
  /** Stable kebab-case key, unique in {@link DEMO_COMPOUNDS}. */
  key: string;
  name: string;
  synonyms: string[];
  /** Molecular formula in Hill order. */
  formula: string;
  smiles: string;
  role: DemoRole;
  /**
   * SIMULATED retention index, invented for the demo by {@link simulatedRetentionIndex}: a rough
   * heuristic of our own, not reference data. Never use it to confirm anything.
   */
  retentionIndex?: { value: number; columnClass: DemoColumnClass };
}

type Row = [key: string, name: string, formula: string, smiles: string, role: DemoRole, synonyms?: string[], ri?: DemoColumnClass];

const SOLVENTS: Row[] = [
  ['methanol', 'Methanol', 'CH4O', 'CO', 'solvent', ['methyl alcohol']],
  ['ethanol', 'Ethanol', 'C2H6O', 'CCO', 'solvent', ['ethyl alcohol']],
  ['acetone', 'Acetone', 'C3H6O', 'CC(C)=O', 'solvent', ['propan-2-one']],
  ['ethyl-acetate', 'Ethyl acetate', 'C4H8O2', 'CCOC(C)=O', 'solvent', [], 'non-polar'],
  ['dichloromethane', 'Dichloromethane', 'CH2Cl2', 'ClCCl', 'solvent', ['methylene chloride']],
  ['chloroform', 'Chloroform', 'CHCl3', 'ClC(Cl)Cl', 'solvent', ['trichloromethane']],
  ['toluene', 'Toluene', 'C7H8', 'Cc1ccccc1', 'solvent', ['methylbenzene'], 'non-polar'],
  ['hexane', 'Hexane', 'C6H14', 'CCCCCC', 'solvent', ['n-hexane']],
  ['tetrahydrofuran', 'Tetrahydrofuran', 'C4H8O', 'C1CCOC1', 'solvent', ['THF', 'oxolane']],
  ['acetonitrile', 'Acetonitrile', 'C2H3N', 'CC#N', 'solvent', ['methyl cyanide']],
  ['mtbe', 'Methyl tert-butyl ether', 'C5H12O', 'COC(C)(C)C', 'solvent', ['MTBE', '2-methoxy-2-methylpropane']],
  ['dmso', 'Dimethyl sulfoxide', 'C2H6OS', 'CS(C)=O', 'solvent', ['DMSO']],
  ['dichloroethane', '1,2-Dichloroethane', 'C2H4Cl2', 'ClCCCl', 'solvent', ['ethylene dichloride']],
];

const ESTERS: Row[] = [
  ['ethyl-butyrate', 'Ethyl butyrate', 'C6H12O2', 'CCCC(=O)OCC', 'raw material', ['ethyl butanoate'], 'non-polar'],
  ['isoamyl-acetate', 'Isoamyl acetate', 'C7H14O2', 'CC(C)CCOC(C)=O', 'raw material', ['3-methylbutyl acetate']],
  ['benzyl-acetate', 'Benzyl acetate', 'C9H10O2', 'CC(=O)OCc1ccccc1', 'raw material', [], 'non-polar'],
  ['linalyl-acetate', 'Linalyl acetate', 'C12H20O2', 'CC(=O)OC(C)(CCC=C(C)C)C=C', 'raw material', [], 'non-polar'],
  ['methyl-salicylate', 'Methyl salicylate', 'C8H8O3', 'COC(=O)c1ccccc1O', 'raw material', ['methyl 2-hydroxybenzoate'], 'polar'],
  ['cis-3-hexenyl-acetate', 'cis-3-Hexenyl acetate', 'C8H14O2', 'CC/C=C\\CCOC(C)=O', 'raw material', ['(Z)-hex-3-en-1-yl acetate']],
  ['methyl-benzoate', 'Methyl benzoate', 'C8H8O2', 'COC(=O)c1ccccc1', 'raw material'],
  ['phenethyl-acetate', '2-Phenylethyl acetate', 'C10H12O2', 'CC(=O)OCCc1ccccc1', 'raw material', ['phenethyl acetate'], 'polar'],
  ['geranyl-acetate', 'Geranyl acetate', 'C12H20O2', 'CC(=O)OC/C=C(\\C)CCC=C(C)C', 'raw material', [], 'non-polar'],
  ['ethyl-hexanoate', 'Ethyl hexanoate', 'C8H16O2', 'CCCCCC(=O)OCC', 'raw material', ['ethyl caproate'], 'non-polar'],
  ['methyl-anthranilate', 'Methyl anthranilate', 'C8H9NO2', 'COC(=O)c1ccccc1N', 'raw material', ['methyl 2-aminobenzoate']],
  ['ethyl-cinnamate', 'Ethyl cinnamate', 'C11H12O2', 'CCOC(=O)/C=C/c1ccccc1', 'raw material', [], 'non-polar'],
  ['benzyl-benzoate', 'Benzyl benzoate', 'C14H12O2', 'O=C(OCc1ccccc1)c1ccccc1', 'raw material', [], 'non-polar'],
  ['methyl-dihydrojasmonate', 'Methyl dihydrojasmonate', 'C13H22O3', 'CCCCCC1C(CC(=O)OC)CCC1=O', 'raw material', [], 'non-polar'],
  ['diethyl-phthalate', 'Diethyl phthalate', 'C12H14O4', 'CCOC(=O)c1ccccc1C(=O)OCC', 'solvent', ['DEP']],
  ['ethyl-methylphenylglycidate', 'Ethyl methylphenylglycidate', 'C12H14O3', 'CCOC(=O)C1OC1(C)c1ccccc1', 'raw material', ['strawberry glycidate'], 'non-polar'],
  ['ethylene-brassylate', 'Ethylene brassylate', 'C15H26O4', 'O=C1CCCCCCCCCCCC(=O)OCCO1', 'raw material', ['1,4-dioxacycloheptadecane-5,17-dione']],
  ['pentadecanolide', 'Pentadecanolide', 'C15H28O2', 'O=C1CCCCCCCCCCCCCCO1', 'raw material', ['oxacyclohexadecan-2-one'], 'non-polar'],
];

const TERPENES: Row[] = [
  ['alpha-pinene', 'alpha-Pinene', 'C10H16', 'CC1=CCC2CC1C2(C)C', 'raw material', [], 'non-polar'],
  ['beta-pinene', 'beta-Pinene', 'C10H16', 'CC1(C)C2CCC(=C)C1C2', 'raw material'],
  ['limonene', 'Limonene', 'C10H16', 'CC1=CCC(CC1)C(C)=C', 'raw material', ['dipentene'], 'non-polar'],
  ['myrcene', 'Myrcene', 'C10H16', 'CC(C)=CCCC(=C)C=C', 'raw material', ['beta-myrcene'], 'non-polar'],
  ['camphene', 'Camphene', 'C10H16', 'CC1(C)C2CCC(C2)C1=C', 'impurity'],
  ['p-cymene', 'p-Cymene', 'C10H14', 'CC(C)c1ccc(C)cc1', 'impurity', ['4-isopropyltoluene'], 'non-polar'],
  ['terpinolene', 'Terpinolene', 'C10H16', 'CC(C)=C1CCC(C)=CC1', 'impurity'],
  ['caryophyllene', 'beta-Caryophyllene', 'C15H24', 'CC1=CCCC(=C)C2CC(C)(C)C2CC1', 'raw material', [], 'non-polar'],
  ['isoprene', 'Isoprene', 'C5H8', 'CC(=C)C=C', 'raw material', ['2-methylbuta-1,3-diene']],
];

const TERPENOIDS: Row[] = [
  ['linalool', 'Linalool', 'C10H18O', 'CC(C)=CCCC(C)(O)C=C', 'raw material', ['3,7-dimethylocta-1,6-dien-3-ol'], 'non-polar'],
  ['geraniol', 'Geraniol', 'C10H18O', 'CC(C)=CCC/C(C)=C/CO', 'raw material', [], 'polar'],
  ['citronellol', 'Citronellol', 'C10H20O', 'CC(CCO)CCC=C(C)C', 'raw material'],
  ['alpha-terpineol', 'alpha-Terpineol', 'C10H18O', 'CC1=CCC(CC1)C(C)(C)O', 'raw material', [], 'non-polar'],
  ['menthol', 'Menthol', 'C10H20O', 'CC(C)C1CCC(C)CC1O', 'raw material', [], 'polar'],
  ['eucalyptol', '1,8-Cineole', 'C10H18O', 'CC12CCC(CC1)C(C)(C)O2', 'raw material', ['eucalyptol'], 'non-polar'],
  ['dihydromyrcenol', 'Dihydromyrcenol', 'C10H20O', 'CC(CCCC(C)(C)O)C=C', 'raw material', ['2,6-dimethyloct-7-en-2-ol']],
  ['nerolidol', 'Nerolidol', 'C15H26O', 'CC(C)=CCCC(C)=CCCC(C)(O)C=C', 'raw material', [], 'non-polar'],
  ['isopulegol', 'Isopulegol', 'C10H18O', 'CC1CCC(C(=C)C)C(O)C1', 'intermediate', [], 'non-polar'],
  ['dehydrolinalool', 'Dehydrolinalool', 'C10H16O', 'CC(C)=CCCC(C)(O)C#C', 'intermediate', ['3,7-dimethyloct-6-en-1-yn-3-ol']],
  ['prenol', 'Prenol', 'C5H10O', 'CC(C)=CCO', 'intermediate', ['3-methylbut-2-en-1-ol']],
  ['rose-oxide', 'Rose oxide', 'C10H18O', 'CC1CCOC(C=C(C)C)C1', 'raw material', [], 'non-polar'],
];

const KETONES: Row[] = [
  ['camphor', 'Camphor', 'C10H16O', 'CC1(C)C2CCC1(C)C(=O)C2', 'raw material'],
  ['menthone', 'Menthone', 'C10H18O', 'CC(C)C1CCC(C)CC1=O', 'impurity', [], 'non-polar'],
  ['carvone', 'Carvone', 'C10H14O', 'CC1=CCC(CC1=O)C(C)=C', 'raw material', [], 'polar'],
  ['alpha-ionone', 'alpha-Ionone', 'C13H20O', 'CC1=CCCC(C)(C)C1/C=C/C(C)=O', 'raw material', [], 'non-polar'],
  ['beta-ionone', 'beta-Ionone', 'C13H20O', 'CC1=C(C(C)(C)CCC1)/C=C/C(C)=O', 'raw material'],
  ['pseudoionone', 'Pseudoionone', 'C13H20O', 'CC(C)=CCC/C(C)=C/C=C/C(C)=O', 'intermediate'],
  ['acetophenone', 'Acetophenone', 'C8H8O', 'CC(=O)c1ccccc1', 'raw material', ['1-phenylethanone'], 'non-polar'],
  ['methylheptenone', '6-Methyl-5-hepten-2-one', 'C8H14O', 'CC(=O)CCC=C(C)C', 'intermediate', ['methyl heptenone'], 'non-polar'],
  ['benzophenone', 'Benzophenone', 'C13H10O', 'O=C(c1ccccc1)c1ccccc1', 'raw material', ['diphenylmethanone'], 'non-polar'],
  ['raspberry-ketone', 'Raspberry ketone', 'C10H12O2', 'CC(=O)CCc1ccc(O)cc1', 'raw material', ['4-(4-hydroxyphenyl)butan-2-one']],
  ['cis-jasmone', 'cis-Jasmone', 'C11H16O', 'CC/C=C\\CC1=C(C)CCC1=O', 'raw material'],
  ['isophorone', 'Isophorone', 'C9H14O', 'CC1=CC(=O)CC(C)(C)C1', 'impurity', [], 'non-polar'],
  ['muscone', 'Muscone', 'C16H30O', 'CC1CCCCCCCCCCCCC(=O)C1', 'raw material', ['3-methylcyclopentadecanone'], 'non-polar'],
];

const ALDEHYDES: Row[] = [
  ['benzaldehyde', 'Benzaldehyde', 'C7H6O', 'O=Cc1ccccc1', 'raw material', [], 'non-polar'],
  ['cinnamaldehyde', 'Cinnamaldehyde', 'C9H8O', 'O=C/C=C/c1ccccc1', 'raw material', ['(E)-3-phenylprop-2-enal']],
  ['vanillin', 'Vanillin', 'C8H8O3', 'COc1cc(C=O)ccc1O', 'raw material', ['4-hydroxy-3-methoxybenzaldehyde'], 'polar'],
  ['citral', 'Geranial', 'C10H16O', 'CC(C)=CCC/C(C)=C/C=O', 'raw material', ['citral a'], 'non-polar'],
  ['citronellal', 'Citronellal', 'C10H18O', 'CC(CC=O)CCC=C(C)C', 'intermediate', [], 'non-polar'],
  ['hexanal', 'Hexanal', 'C6H12O', 'CCCCCC=O', 'impurity', ['caproaldehyde']],
  ['decanal', 'Decanal', 'C10H20O', 'CCCCCCCCCC=O', 'raw material', [], 'non-polar'],
  ['phenylacetaldehyde', 'Phenylacetaldehyde', 'C8H8O', 'O=CCc1ccccc1', 'raw material', [], 'polar'],
  ['anisaldehyde', 'p-Anisaldehyde', 'C8H8O2', 'COc1ccc(C=O)cc1', 'raw material', ['4-methoxybenzaldehyde'], 'non-polar'],
  ['piperonal', 'Piperonal', 'C8H6O3', 'O=Cc1ccc2OCOc2c1', 'raw material', ['heliotropin']],
  ['hexyl-cinnamaldehyde', 'alpha-Hexylcinnamaldehyde', 'C15H20O', 'CCCCCCC(=Cc1ccccc1)C=O', 'raw material'],
  ['furfural', 'Furfural', 'C5H4O2', 'O=Cc1ccco1', 'impurity', ['furan-2-carbaldehyde'], 'polar'],
  ['helional', 'Helional', 'C11H12O3', 'CC(Cc1ccc2OCOc2c1)C=O', 'raw material', [], 'non-polar'],
  ['acetaldehyde', 'Acetaldehyde', 'C2H4O', 'CC=O', 'impurity', ['ethanal']],
];

const LACTONES: Row[] = [
  ['gamma-butyrolactone', 'gamma-Butyrolactone', 'C4H6O2', 'O=C1CCCO1', 'solvent', ['GBL']],
  ['gamma-nonalactone', 'gamma-Nonalactone', 'C9H16O2', 'CCCCCC1CCC(=O)O1', 'raw material', ['aldehyde C-18 (trade name)'], 'non-polar'],
  ['gamma-decalactone', 'gamma-Decalactone', 'C10H18O2', 'CCCCCCC1CCC(=O)O1', 'raw material'],
  ['delta-decalactone', 'delta-Decalactone', 'C10H18O2', 'CCCCCC1CCCC(=O)O1', 'raw material'],
  ['coumarin', 'Coumarin', 'C9H6O2', 'O=c1ccc2ccccc2o1', 'raw material', ['2H-chromen-2-one'], 'non-polar'],
  ['dihydrocoumarin', 'Dihydrocoumarin', 'C9H8O2', 'O=C1CCc2ccccc2O1', 'impurity'],
];

const PHENOLS_ETHERS_ALCOHOLS: Row[] = [
  ['phenol', 'Phenol', 'C6H6O', 'Oc1ccccc1', 'impurity', [], 'polar'],
  ['eugenol', 'Eugenol', 'C10H12O2', 'COc1cc(CC=C)ccc1O', 'raw material', [], 'non-polar'],
  ['isoeugenol', 'Isoeugenol', 'C10H12O2', 'COc1cc(/C=C/C)ccc1O', 'raw material'],
  ['guaiacol', 'Guaiacol', 'C7H8O2', 'COc1ccccc1O', 'impurity', ['2-methoxyphenol']],
  ['thymol', 'Thymol', 'C10H14O', 'Cc1ccc(C(C)C)c(O)c1', 'raw material', [], 'non-polar'],
  ['anethole', 'trans-Anethole', 'C10H12O', 'COc1ccc(/C=C/C)cc1', 'raw material', [], 'non-polar'],
  ['diphenyl-ether', 'Diphenyl ether', 'C12H10O', 'c1ccc(Oc2ccccc2)cc1', 'raw material', ['phenoxybenzene'], 'non-polar'],
  ['bht', 'Butylated hydroxytoluene', 'C15H24O', 'Cc1cc(C(C)(C)C)c(O)c(C(C)(C)C)c1', 'impurity', ['BHT', '2,6-di-tert-butyl-4-methylphenol']],
  ['phenethyl-alcohol', '2-Phenylethanol', 'C8H10O', 'OCCc1ccccc1', 'raw material', ['phenethyl alcohol'], 'polar'],
  ['benzyl-alcohol', 'Benzyl alcohol', 'C7H8O', 'OCc1ccccc1', 'impurity', ['phenylmethanol'], 'polar'],
  ['nerolin', '2-Ethoxynaphthalene', 'C12H12O', 'CCOc1ccc2ccccc2c1', 'raw material', ['nerolin'], 'non-polar'],
  ['cis-3-hexenol', 'cis-3-Hexen-1-ol', 'C6H12O', 'CC/C=C\\CCO', 'raw material', ['leaf alcohol']],
  ['2-ethylhexanol', '2-Ethylhexanol', 'C8H18O', 'CCCCC(CC)CO', 'impurity'],
  ['dibenzyl-ether', 'Dibenzyl ether', 'C14H14O', 'C(OCc1ccccc1)c1ccccc1', 'impurity'],
];

const ACIDS: Row[] = [
  ['acetic-acid', 'Acetic acid', 'C2H4O2', 'CC(=O)O', 'raw material'],
  ['benzoic-acid', 'Benzoic acid', 'C7H6O2', 'OC(=O)c1ccccc1', 'impurity', [], 'polar'],
  ['isovaleric-acid', 'Isovaleric acid', 'C5H10O2', 'CC(C)CC(=O)O', 'impurity', ['3-methylbutanoic acid'], 'polar'],
];

const HALOGENATED: Row[] = [
  ['benzyl-chloride', 'Benzyl chloride', 'C7H7Cl', 'ClCc1ccccc1', 'intermediate', ['(chloromethyl)benzene'], 'non-polar'],
  ['benzal-chloride', 'Benzal chloride', 'C7H6Cl2', 'ClC(Cl)c1ccccc1', 'impurity', ['(dichloromethyl)benzene']],
  ['benzotrichloride', 'Benzotrichloride', 'C7H5Cl3', 'ClC(Cl)(Cl)c1ccccc1', 'impurity', ['(trichloromethyl)benzene']],
  ['2-chlorophenol', '2-Chlorophenol', 'C6H5ClO', 'Oc1ccccc1Cl', 'impurity', [], 'non-polar'],
  ['2-4-dichlorophenol', '2,4-Dichlorophenol', 'C6H4Cl2O', 'Oc1ccc(Cl)cc1Cl', 'impurity'],
  ['trichloroanisole', '2,4,6-Trichloroanisole', 'C7H5Cl3O', 'COc1c(Cl)cc(Cl)cc1Cl', 'impurity', ['TCA'], 'non-polar'],
  ['chlorobenzene', 'Chlorobenzene', 'C6H5Cl', 'Clc1ccccc1', 'solvent'],
  ['4-chlorobenzaldehyde', '4-Chlorobenzaldehyde', 'C7H5ClO', 'O=Cc1ccc(Cl)cc1', 'intermediate'],
  ['ethyl-chloroacetate', 'Ethyl chloroacetate', 'C4H7ClO2', 'CCOC(=O)CCl', 'raw material', [], 'non-polar'],
  ['prenyl-chloride', 'Prenyl chloride', 'C5H9Cl', 'CC(C)=CCCl', 'intermediate', ['1-chloro-3-methylbut-2-ene']],
  ['geranyl-chloride', 'Geranyl chloride', 'C10H17Cl', 'CC(C)=CCC/C(C)=C/CCl', 'intermediate'],
  ['epichlorohydrin', 'Epichlorohydrin', 'C3H5ClO', 'ClCC1CO1', 'raw material', ['2-(chloromethyl)oxirane']],
  ['benzyl-bromide', 'Benzyl bromide', 'C7H7Br', 'BrCc1ccccc1', 'intermediate', ['(bromomethyl)benzene'], 'non-polar'],
  ['bromobenzene', 'Bromobenzene', 'C6H5Br', 'Brc1ccccc1', 'raw material'],
  ['4-bromoanisole', '4-Bromoanisole', 'C7H7BrO', 'COc1ccc(Br)cc1', 'intermediate', [], 'non-polar'],
  ['1-bromohexane', '1-Bromohexane', 'C6H13Br', 'CCCCCCBr', 'intermediate'],
  ['dibromoethane', '1,2-Dibromoethane', 'C2H4Br2', 'BrCCBr', 'impurity', ['ethylene dibromide']],
  ['2-4-dibromophenol', '2,4-Dibromophenol', 'C6H4Br2O', 'Oc1ccc(Br)cc1Br', 'impurity', [], 'non-polar'],
  ['bromochloropropane', '1-Bromo-3-chloropropane', 'C3H6BrCl', 'ClCCCBr', 'raw material'],
  ['phenacyl-bromide', '2-Bromoacetophenone', 'C8H7BrO', 'BrCC(=O)c1ccccc1', 'intermediate', ['phenacyl bromide']],
];

const SULFUR_NITROGEN: Row[] = [
  ['dimethyl-disulfide', 'Dimethyl disulfide', 'C2H6S2', 'CSSC', 'impurity', [], 'non-polar'],
  ['dimethyl-trisulfide', 'Dimethyl trisulfide', 'C2H6S3', 'CSSSC', 'impurity'],
  ['thiophene', 'Thiophene', 'C4H4S', 'c1ccsc1', 'impurity'],
  ['furfuryl-mercaptan', 'Furfuryl mercaptan', 'C5H6OS', 'SCc1ccco1', 'raw material', ['2-furanmethanethiol'], 'polar'],
  ['methional', 'Methional', 'C4H8OS', 'CSCCC=O', 'raw material', ['3-(methylthio)propanal']],
  ['benzothiazole', 'Benzothiazole', 'C7H5NS', 'c1ccc2scnc2c1', 'impurity', [], 'non-polar'],
  ['2-acetylthiazole', '2-Acetylthiazole', 'C5H5NOS', 'CC(=O)c1nccs1', 'raw material'],
  ['allyl-isothiocyanate', 'Allyl isothiocyanate', 'C4H5NS', 'C=CCN=C=S', 'raw material'],
  ['diallyl-disulfide', 'Diallyl disulfide', 'C6H10S2', 'C=CCSSCC=C', 'raw material'],
  ['mercaptohexyl-acetate', '3-Mercaptohexyl acetate', 'C8H16O2S', 'CCCC(S)CCOC(C)=O', 'raw material', [], 'polar'],
  ['indole', 'Indole', 'C8H7N', 'c1ccc2[nH]ccc2c1', 'raw material', [], 'polar'],
  ['skatole', 'Skatole', 'C9H9N', 'Cc1c[nH]c2ccccc12', 'impurity', ['3-methylindole']],
  ['ibmp', '2-Isobutyl-3-methoxypyrazine', 'C9H14N2O', 'COc1nccnc1CC(C)C', 'raw material', [], 'non-polar'],
  ['dimethylpyrazine', '2,5-Dimethylpyrazine', 'C6H8N2', 'Cc1cnc(C)cn1', 'raw material'],
  ['benzyl-cyanide', 'Benzyl cyanide', 'C8H7N', 'N#CCc1ccccc1', 'intermediate', ['phenylacetonitrile']],
  ['citronellyl-nitrile', 'Citronellyl nitrile', 'C10H17N', 'CC(CC#N)CCC=C(C)C', 'raw material', ['3,7-dimethyloct-6-enenitrile'], 'non-polar'],
  ['dimethyl-anthranilate', 'Methyl N-methylanthranilate', 'C9H11NO2', 'CNc1ccccc1C(=O)OC', 'raw material', [], 'non-polar'],
  ['nitrobenzene', 'Nitrobenzene', 'C6H5NO2', 'O=[N+]([O-])c1ccccc1', 'impurity'],
];

const IMPURITIES_MISC: Row[] = [
  ['dibutyl-phthalate', 'Dibutyl phthalate', 'C16H22O4', 'CCCCOC(=O)c1ccccc1C(=O)OCCCC', 'impurity', ['DBP'], 'non-polar'],
  ['dehp', 'Bis(2-ethylhexyl) phthalate', 'C24H38O4', 'CCCCC(CC)COC(=O)c1ccccc1C(=O)OCC(CC)CCCC', 'impurity', ['DEHP']],
  ['hexamethyldisiloxane', 'Hexamethyldisiloxane', 'C6H18OSi2', 'C[Si](C)(C)O[Si](C)(C)C', 'impurity', ['HMDSO']],
  ['octamethylcyclotetrasiloxane', 'Octamethylcyclotetrasiloxane', 'C8H24O4Si4', 'C[Si]1(C)O[Si](C)(C)O[Si](C)(C)O[Si](C)(C)O1', 'impurity', ['D4'], 'non-polar'],
];

const DERIVATIVES: Row[] = [
  ['phenol-tms', 'Phenol, TMS ether', 'C9H14OSi', 'C[Si](C)(C)Oc1ccccc1', 'derivative', ['trimethylphenoxysilane'], 'non-polar'],
  ['benzyl-alcohol-tms', 'Benzyl alcohol, TMS ether', 'C10H16OSi', 'C[Si](C)(C)OCc1ccccc1', 'derivative'],
  ['geraniol-tms', 'Geraniol, TMS ether', 'C13H26OSi', 'CC(C)=CCC/C(C)=C/CO[Si](C)(C)C', 'derivative', [], 'non-polar'],
  ['linalool-tms', 'Linalool, TMS ether', 'C13H26OSi', 'CC(C)=CCCC(C)(O[Si](C)(C)C)C=C', 'derivative'],
  ['eugenol-tms', 'Eugenol, TMS ether', 'C13H20O2Si', 'COc1cc(CC=C)ccc1O[Si](C)(C)C', 'derivative'],
  ['vanillin-tms', 'Vanillin, TMS ether', 'C11H16O3Si', 'COc1cc(C=O)ccc1O[Si](C)(C)C', 'derivative'],
  ['benzoic-acid-tms', 'Benzoic acid, TMS ester', 'C10H14O2Si', 'C[Si](C)(C)OC(=O)c1ccccc1', 'derivative', [], 'non-polar'],
  ['salicylic-acid-2tms', 'Salicylic acid, 2TMS', 'C13H22O3Si2', 'C[Si](C)(C)OC(=O)c1ccccc1O[Si](C)(C)C', 'derivative'],
];

/**
 * A SIMULATED retention index for the demo: an invented heuristic, not reference data and not a
 * method from the literature. On a non-polar column each carbon counts 100 (so n-alkanes land on
 * 100·n, as the index scale defines them) and each heteroatom a rough increment; aromatic rings add
 * a little; a polar column adds more for oxygen and nitrogen. A per-key jitter of ±20 keeps the
 * values from looking computed. Good enough to exercise the retention-index filter, nothing more.
 */
export function simulatedRetentionIndex(key: string, formula: string, smiles: string, columnClass: DemoColumnClass): number {
  const counts = parseFormula(formula);
  const c = counts.C ?? 0;
  const o = counts.O ?? 0;
  const n = counts.N ?? 0;
  const s = counts.S ?? 0;
  const cl = counts.Cl ?? 0;
  const br = counts.Br ?? 0;
  const si = counts.Si ?? 0;
  const aromatic = /c/.test(smiles) ? 1 : 0;
  let value = 100 * c + 60 * o + 90 * n + 170 * s + 190 * cl + 280 * br + 40 * si + 60 * aromatic;
  if (columnClass === 'polar') value += 150 + 260 * o + 220 * n + 120 * s + 80 * cl + 140 * aromatic;
  const jitter = (demoTextHash(key) % 41) - 20;
  return Math.max(300, Math.round(value + jitter));
}

const ALL_ROWS: Row[] = [
  ...SOLVENTS,
  ...ESTERS,
  ...TERPENES,
  ...TERPENOIDS,
  ...KETONES,
  ...ALDEHYDES,
  ...LACTONES,
  ...PHENOLS_ETHERS_ALCOHOLS,
  ...ACIDS,
  ...HALOGENATED,
  ...SULFUR_NITROGEN,
  ...IMPURITIES_MISC,
  ...DERIVATIVES,
];

/**
 * The demo library's compounds: real, well-known small organic compounds that an aroma-chemicals
 * plant buys, makes, finds or uses. No CAS numbers and no measured data: only names, formulas and
 * structures (facts of chemistry), an invented role, and for about half a simulated retention index.
 */
export const DEMO_COMPOUNDS: readonly DemoCompound[] = Object.freeze(
  ALL_ROWS.map(([key, name, formula, smiles, role, synonyms = [], ri]): DemoCompound => {
    const compound: DemoCompound = { key, name, synonyms, formula, smiles, role };
    if (ri) compound.retentionIndex = { value: simulatedRetentionIndex(key, formula, smiles, ri), columnClass: ri };
    return compound;
  }),
);
