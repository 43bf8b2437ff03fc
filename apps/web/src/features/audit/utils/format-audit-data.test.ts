import { describe, expect, it } from 'vitest';
import { formatAuditData } from './format-audit-data';

describe('formatAuditData', () => {
  it('when data has nested before/after objects, spells them with dots', () => {
    expect(formatAuditData({ before: { state: 'in_review' }, after: { state: 'published' }, lockVersion: 4 })).toBe(
      'before.state=in_review after.state=published lockVersion=4',
    );
  });

  it('when a value has spaces or is a list, quotes or serialises it', () => {
    expect(formatAuditData({ reason: 'wrong lot', scopes: ['search', 'submit'], ok: true })).toBe(
      'reason="wrong lot" scopes=["search","submit"] ok=true',
    );
  });

  it('when there is no data, gives an empty text', () => {
    expect(formatAuditData(null)).toBe('');
    expect(formatAuditData({})).toBe('');
  });
});
