import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestContext, type TestContext } from '../../testing/test-app';
import { createLogger } from '../../shared/logger';
import { createMailDispatcher, queueMail } from './mail.service';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => {
  await ctx.close();
});

// Other tests leave pending mails in the shared test database; put this test's own mail at the
// front of the queue so that one dispatcher pass handles exactly it.
async function firstInLine(to: string) {
  await ctx.ds.query(`UPDATE mail_messages SET next_attempt_at = now() - interval '1 day' WHERE to_address = $1`, [to]);
}

describe('mail outbox', () => {
  it('sends queued mail through SMTP to the fake server and marks it sent', async () => {
    const to = `outbox-${Date.now()}@quillmere.example`;
    await ctx.ds.transaction((m) => queueMail(m, { to, subject: 'Outbox check', text: 'Body line' }));
    await firstInLine(to);
    const dispatcher = createMailDispatcher(ctx.ds, { host: '127.0.0.1', port: ctx.smtp.port, secure: false, from: 'Ionfolio <ionfolio@quillmere.example>' }, createLogger('silent'));
    await dispatcher.sendDue(1);
    dispatcher.stop();
    const got = ctx.smtp.messages.find((m) => m.to.includes(to));
    expect(got).toMatchObject({ subject: 'Outbox check', from: 'ionfolio@quillmere.example' });
    expect(got?.text.trim()).toBe('Body line');
    const rows = await ctx.ds.query(`SELECT status, attempts FROM mail_messages WHERE to_address = $1`, [to]);
    expect(rows).toEqual([{ status: 'sent', attempts: 1 }]);
  });

  it('when the SMTP server is down, keeps the mail pending for a retry', async () => {
    const to = `down-${Date.now()}@quillmere.example`;
    await ctx.ds.transaction((m) => queueMail(m, { to, subject: 'Later', text: 'x' }));
    await firstInLine(to);
    // Port 1 on loopback: nothing listens there, the connection is refused at once.
    const dispatcher = createMailDispatcher(ctx.ds, { host: '127.0.0.1', port: 1, secure: false, from: 'x@quillmere.example' }, createLogger('silent'));
    await dispatcher.sendDue(1);
    dispatcher.stop();
    const rows = await ctx.ds.query(
      `SELECT status, attempts, last_error IS NOT NULL AS has_error, next_attempt_at > now() AS later FROM mail_messages WHERE to_address = $1`,
      [to],
    );
    expect(rows).toEqual([{ status: 'pending', attempts: 1, has_error: true, later: true }]);
  });
});
