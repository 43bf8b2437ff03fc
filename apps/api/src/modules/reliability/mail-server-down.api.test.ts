import net from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startFakeSmtp, type FakeSmtp } from '@ionfolio/fakes';
import { createTestContext, signInAs, type TestContext } from '../../testing/test-app';
import { chlorobenzeneContent } from '../../testing/fixtures';
import { createLogger } from '../../shared/logger';
import { createMailDispatcher } from '../mail/mail.service';
import { createScratchDatabase, type ScratchDatabase } from './scratch-database';

const W = { 'X-Requested-With': 'ionfolio' };

// A database of its own: the shared test database holds other tests' pending mails, which would
// fill the dispatcher's passes before this test's mail came up.
let db: ScratchDatabase;
let ctx: TestContext;
let laterSmtp: FakeSmtp | undefined;
beforeAll(async () => {
  db = await createScratchDatabase('ionfolio_mail');
  ctx = await createTestContext({ DATABASE_URL: db.url });
});
afterAll(async () => {
  await laterSmtp?.close();
  await ctx?.close();
  await db?.drop();
});

/** A loopback port nobody listens on (taken and released at once), where the mail server will come up later. */
function unusedPort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => resolve(typeof address === 'object' && address ? address.port : 0));
    });
  });
}

describe('the mail server is down when a curator decides', () => {
  it('the decision succeeds, its mail waits in the outbox, and goes out once the server is back', async () => {
    const smtpPort = await unusedPort();
    const dispatcher = createMailDispatcher(
      ctx.ds,
      { host: '127.0.0.1', port: smtpPort, secure: false, from: 'Ionfolio <ionfolio@quillmere.example>' },
      createLogger('silent'),
    );
    try {
      const author = await signInAs(ctx, 'contributor');
      const curator = await signInAs(ctx, 'curator');
      const r = (await author.agent.post('/api/v1/entries').set(W).send(chlorobenzeneContent()).expect(201)).body.revision;
      const sent = (await author.agent.post(`/api/v1/revisions/${r.id}/submit`).set(W).send({ lockVersion: r.lockVersion }).expect(200)).body.revision;
      const decided = await curator.agent
        .post(`/api/v1/revisions/${r.id}/decision`)
        .set(W)
        .send({ decision: 'publish', comment: '', lockVersion: sent.lockVersion })
        .expect(200);
      expect(decided.body.revision.state).toBe('published');
      const to = `${author.login}@users.stand-in.example`;
      const subject = `Ionfolio: ${r.accession} r1 Chlorobenzene (test) was published`;
      const outbox = () =>
        ctx.ds.query(`SELECT status, attempts FROM mail_messages WHERE to_address = $1 AND subject = $2`, [to, subject]) as Promise<
          { status: string; attempts: number }[]
        >;

      // Other tests leave pending mails in the shared test database: put this one first in line so
      // that each single-mail pass below handles exactly it.
      await ctx.ds.query(`UPDATE mail_messages SET next_attempt_at = now() - interval '1 day' WHERE to_address = $1 AND subject = $2`, [to, subject]);
      // Nothing listens: the pass fails, the mail stays pending with one attempt counted.
      await dispatcher.sendDue(1);
      expect(await outbox()).toEqual([{ status: 'pending', attempts: 1 }]);
      await dispatcher.sendDue(1);
      // Still one attempt: the back-off holds it until next_attempt_at.
      expect(await outbox()).toEqual([{ status: 'pending', attempts: 1 }]);

      laterSmtp = await startFakeSmtp({ port: smtpPort });
      // The back-off after a first failure is 2 s; the test moves next_attempt_at to now instead of waiting.
      await ctx.ds.query(`UPDATE mail_messages SET next_attempt_at = now() - interval '1 day' WHERE to_address = $1 AND status = 'pending'`, [to]);
      await dispatcher.sendDue(1);
      expect(await outbox()).toEqual([{ status: 'sent', attempts: 2 }]);
      expect(laterSmtp.messages.filter((m) => m.to.includes(to)).map((m) => m.subject)).toEqual([subject]);
    } finally {
      dispatcher.stop();
    }
  });
});
