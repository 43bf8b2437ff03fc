import type { DataSource, EntityManager } from 'typeorm';
import nodemailer, { type Transporter } from 'nodemailer';
import type { Logger } from 'pino';
import { MailMessageEntity, type MailMessageRow } from './mail-message.entity';

/** Queues a mail in the outbox inside the caller's transaction; the dispatcher sends it later. */
export async function queueMail(m: EntityManager, mail: { to: string; subject: string; text: string }): Promise<void> {
  await m.getRepository<MailMessageRow>(MailMessageEntity).insert({
    toAddress: mail.to,
    subject: mail.subject,
    bodyText: mail.text,
    status: 'pending',
    attempts: 0,
    nextAttemptAt: new Date(),
  });
}

export interface MailConfig {
  host: string;
  port: number;
  secure: boolean;
  user?: string | undefined;
  password?: string | undefined;
  from: string;
}

const MAX_ATTEMPTS = 8;

/**
 * Sends pending outbox mails through SMTP. Each mail is claimed with SKIP LOCKED so several API
 * processes never send one twice; a failure is retried with exponential back-off.
 */
export function createMailDispatcher(ds: DataSource, config: MailConfig, log: Logger) {
  const transport: Transporter = nodemailer.createTransport({
    host: config.host,
    port: config.port,
    secure: config.secure,
    ignoreTLS: !config.secure,
    auth: config.user ? { user: config.user, pass: config.password ?? '' } : undefined,
  });

  async function sendDue(limit = 20): Promise<number> {
    let sent = 0;
    for (let i = 0; i < limit; i++) {
      const done = await ds.transaction(async (m) => {
        const rows: MailMessageRow[] = await m.query(
          `SELECT id, to_address AS "toAddress", subject, body_text AS "bodyText", attempts
             FROM mail_messages WHERE status = 'pending' AND next_attempt_at <= now()
             ORDER BY next_attempt_at LIMIT 1 FOR UPDATE SKIP LOCKED`,
        );
        const mail = rows[0];
        if (!mail) return null;
        try {
          await transport.sendMail({ from: config.from, to: mail.toAddress, subject: mail.subject, text: mail.bodyText });
          await m.query(`UPDATE mail_messages SET status = 'sent', sent_at = now(), attempts = attempts + 1 WHERE id = $1`, [mail.id]);
          return true;
        } catch (err) {
          const attempts = mail.attempts + 1;
          log.warn({ err, mailId: mail.id, attempts }, 'mail not sent; will retry');
          await m.query(
            `UPDATE mail_messages SET attempts = $2, last_error = $3,
               status = CASE WHEN $2 >= ${MAX_ATTEMPTS} THEN 'failed' ELSE 'pending' END,
               next_attempt_at = now() + make_interval(secs => least(600, power(2, $2)))
             WHERE id = $1`,
            [mail.id, attempts, String((err as Error).message).slice(0, 500)],
          );
          return false;
        }
      });
      if (done === null) break;
      if (done) sent++;
    }
    return sent;
  }

  let timer: NodeJS.Timeout | undefined;
  return {
    sendDue,
    start(intervalMs = 2000) {
      timer = setInterval(() => {
        sendDue().catch((err: unknown) => log.warn({ err }, 'mail dispatcher pass failed'));
      }, intervalMs);
      timer.unref();
    },
    stop() {
      if (timer) clearInterval(timer);
      transport.close();
    },
  };
}
