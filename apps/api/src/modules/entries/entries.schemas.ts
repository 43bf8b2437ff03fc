import { z } from 'zod';
import { AccessionSchema } from '@ionfolio/contracts';
import { isElementSymbol, type ElementSymbol } from '@ionfolio/chem';
import { parseFormulaFilter } from './formula-filter';

export const AccessionParams = z.object({ accession: AccessionSchema });
export const RevisionIdParams = z.object({ id: z.uuid('must be a revision id (uuid)') });

const SORT_KEYS = ['relevance', 'accession', 'name', 'nominalMass', 'updatedAt'] as const;

/** `elements=Cl,Br`: symbols the formula must contain, each checked against the element table. */
const ElementList = z
  .string()
  .trim()
  .max(100)
  .transform((text, ctx) => {
    const symbols = text.split(/[\s,]+/).filter(Boolean);
    for (const symbol of symbols) {
      if (!isElementSymbol(symbol)) {
        ctx.addIssue({ code: 'custom', message: `"${symbol}" is not an element this library knows (e.g. Cl, Br, N)` });
        return z.NEVER;
      }
    }
    return [...new Set(symbols)] as ElementSymbol[];
  });

/**
 * Filters, sort and paging of `GET /entries` and `GET /entries.csv`. Everything is optional; the
 * defaults give what the first version answered (published entries in accession order).
 */
export const ListEntriesQuery = z
  .object({
    q: z.string().trim().max(200).optional(),
    formula: z
      .string()
      .trim()
      .min(1)
      .max(100)
      .transform((text, ctx) => {
        try {
          return parseFormulaFilter(text);
        } catch (err) {
          ctx.addIssue({ code: 'custom', message: (err as Error).message });
          return z.NEVER;
        }
      })
      .optional(),
    minMass: z.coerce.number().int().min(0).max(5000).optional(),
    maxMass: z.coerce.number().int().min(0).max(5000).optional(),
    elements: ElementList.optional(),
    hasRetentionIndex: z.enum(['true', 'false']).transform((v) => v === 'true').optional(),
    status: z.enum(['published', 'withdrawn', 'any']).default('published'),
    contributor: z.string().trim().min(1).max(100).optional(),
    edition: z.string().trim().min(1).max(32).optional(),
    sort: z.enum(SORT_KEYS).optional(),
    order: z.enum(['asc', 'desc']).optional(),
    limit: z.coerce.number().int().min(1).max(500).default(100),
    cursor: z.string().max(400).optional(),
  })
  .refine((v) => v.minMass === undefined || v.maxMass === undefined || v.minMass <= v.maxMass, {
    path: ['maxMass'],
    message: 'maxMass is below minMass',
  })
  .refine((v) => v.sort !== 'relevance' || (v.q !== undefined && v.q !== ''), {
    path: ['sort'],
    message: 'sort=relevance needs a name to rank by (q)',
  });

export type ListEntriesFilter = z.infer<typeof ListEntriesQuery>;
export type ListSortKey = (typeof SORT_KEYS)[number];
