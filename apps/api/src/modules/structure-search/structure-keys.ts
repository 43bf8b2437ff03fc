import { Molecule, SSSearcherWithIndex } from 'openchemlib';

/** What structure search keeps per revision: the canonical idcode and the 512-bit screening index. */
export interface StructureKeys {
  idcode: string;
  /** 512 characters of '0'/'1', the form PostgreSQL reads as `bit(512)`. */
  indexBits: string;
}

const searcher = new SSSearcherWithIndex();

/** openchemlib's index is 16 signed 32-bit words; PostgreSQL wants the bits as text. */
export function indexToBits(index: readonly number[]): string {
  return index.map((word) => (word >>> 0).toString(2).padStart(32, '0')).join('');
}

/** The inverse of {@link indexToBits}. */
export function bitsToIndex(bits: string): number[] {
  const index: number[] = [];
  for (let i = 0; i < bits.length; i += 32) index.push(parseInt(bits.slice(i, i + 32), 2) | 0);
  return index;
}

/** Reads a revision's structure (SMILES or molfile); throws openchemlib's error when it cannot. */
export function readStructure(structure: string, format: 'smiles' | 'molfile'): Molecule {
  const mol = format === 'smiles' ? Molecule.fromSmiles(structure) : Molecule.fromMolfile(structure);
  if (mol.getAllAtoms() === 0) throw new Error('the structure has no atoms');
  return mol;
}

/** The keys of one molecule, as kept in `structure_keys`. */
export function structureKeys(mol: Molecule): StructureKeys {
  return { idcode: mol.getIDCode(), indexBits: indexToBits(searcher.createIndex(mol)) };
}

/** The query side of a substructure search: the fragment, flagged as such, with its index. */
export function fragmentOf(smiles: string): { fragment: Molecule; index: number[]; indexBits: string } {
  const fragment = Molecule.fromSmiles(smiles);
  if (fragment.getAllAtoms() === 0) throw new Error('the fragment has no atoms');
  fragment.setFragment(true);
  const index = searcher.createIndex(fragment);
  return { fragment, index, indexBits: indexToBits(index) };
}

/**
 * A test "does the fragment occur in the molecule stored as this idcode and index?" (openchemlib's
 * atom-by-atom match). The fragment is set once; each call only sets the molecule.
 */
export function fragmentMatcher(fragment: Molecule, fragmentIndex: number[]): (idcode: string, indexBits: string) => boolean {
  const matcher = new SSSearcherWithIndex();
  matcher.setFragment(fragment, fragmentIndex);
  return (idcode, indexBits) => {
    matcher.setMolecule(Molecule.fromIDCode(idcode), bitsToIndex(indexBits));
    return matcher.isFragmentInMolecule();
  };
}
