import { Router, type RequestHandler } from 'express';
import { requireRole } from '../../shared/require-role';
import { readQuery } from '../identify/identify.service';
import { FormulaParams, ReadingBody } from './formulas.schemas';
import { describeFormula } from './formulas.service';

export function formulasRoutes(options: { limit: RequestHandler }): Router {
  const r = Router();
  const access = requireRole('reader', { scope: 'search' });

  r.get('/formulas/:formula', access, (req, res) => {
    const { formula } = FormulaParams.parse(req.params);
    res.json(describeFormula(formula));
  });

  r.post('/readings', access, options.limit, (req, res) => {
    const { peaks } = ReadingBody.parse(req.body);
    res.json({ reading: readQuery(peaks) });
  });

  return r;
}
