import { Router } from 'express';
import { z } from 'zod';
import { Molecule } from 'openchemlib';
import { nominalMass } from '@ionfolio/chem';
import { AppError } from '../../shared/app-error';
import { requireRole } from '../../shared/require-role';

const PreviewBody = z.strictObject({
  structure: z.string().trim().min(1, 'give a SMILES string or a molfile').max(200_000),
  format: z.enum(['smiles', 'molfile']),
});

/** Reads a structure with openchemlib and draws it; the SVG is built by the library, not from user text. */
export function structurePreview(structure: string, format: 'smiles' | 'molfile') {
  let mol: Molecule;
  try {
    mol = format === 'smiles' ? Molecule.fromSmiles(structure) : Molecule.fromMolfile(structure);
  } catch (err) {
    throw new AppError('UNREADABLE_STRUCTURE', 400, `The ${format === 'smiles' ? 'SMILES' : 'molfile'} could not be read: ${String((err as Error).message).replace(/^Class\$\S+\s*/, '')}`);
  }
  if (mol.getAllAtoms() === 0) throw new AppError('UNREADABLE_STRUCTURE', 400, 'The structure has no atoms');
  const formula = mol.getMolecularFormula().formula;
  return { svg: mol.toSVG(320, 220, undefined, { suppressChiralText: true }), formula, nominalMass: nominalMass(formula) };
}

export function structuresRoutes(): Router {
  const r = Router();
  r.post('/structures/preview', requireRole('reader'), (req, res) => {
    const { structure, format } = PreviewBody.parse(req.body);
    res.json(structurePreview(structure, format));
  });
  return r;
}
