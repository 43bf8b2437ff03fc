import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { createTestContext, signInAs, type TestContext } from '../../testing/test-app';

let ctx: TestContext;
let reader: Awaited<ReturnType<typeof signInAs>>;
beforeAll(async () => {
  ctx = await createTestContext({ IDENTIFY_RATE_PER_MINUTE: '100000' });
  reader = await signInAs(ctx, 'reader');
});
afterAll(async () => {
  await ctx.close();
});

const W = { 'X-Requested-With': 'ionfolio' };

const number = fc.oneof(
  fc.double({ noNaN: false }),
  fc.integer({ min: -10, max: 6000 }),
  fc.constantFrom(0, -1, 1e308, Number.MAX_SAFE_INTEGER),
);
const peak = fc.oneof(fc.tuple(number, number), fc.array(number, { maxLength: 3 }), fc.string({ maxLength: 5 }), fc.constant(null));
const body = fc.record(
  {
    peaks: fc.oneof(fc.array(peak, { maxLength: 30 }), fc.string({ maxLength: 10 }), fc.constant(null), number),
    method: fc.oneof(fc.constantFrom('composite', 'cosine', 'weighted', 'entropy'), fc.string({ maxLength: 8 })),
    reverse: fc.oneof(fc.boolean(), fc.string({ maxLength: 3 })),
    limit: fc.oneof(number, fc.string({ maxLength: 3 })),
    edition: fc.oneof(fc.string({ maxLength: 12 }), fc.constant(null)),
    retentionIndex: fc.oneof(
      fc.record({ value: number, column: fc.constantFrom('non-polar', 'polar', 'x'), tolerance: number }),
      fc.constant('x'),
    ),
    minMass: number,
    maxMass: number,
    extra: fc.anything({ maxDepth: 2 }),
  },
  { requiredKeys: [] },
);

// fast-check (seeded) over the identify body: whatever a tool sends, the answer is a 200 with
// candidates or a 4xx JSON error that names a field — never a 5xx.
describe('POST /api/v1/identify with arbitrary bodies', () => {
  it('answers 200 or a 4xx naming the problem, never 5xx', async () => {
    await fc.assert(
      fc.asyncProperty(body, async (b) => {
        // JSON cannot carry NaN or Infinity; they arrive as null, as from any real client.
        const res = await reader.agent.post('/api/v1/identify').set(W).send(JSON.parse(JSON.stringify(b)));
        expect(res.status).toBeLessThan(500);
        if (res.status === 200) {
          expect(Array.isArray(res.body.candidates)).toBe(true);
        } else {
          expect(res.status).toBeGreaterThanOrEqual(400);
          expect(typeof res.body.error?.code).toBe('string');
          expect(res.body.error.message.length).toBeGreaterThan(5);
        }
      }),
      { numRuns: 150, seed: 20261202 },
    );
  });
});
