import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';

export interface CapturedMail {
  from: string;
  to: string[];
  subject: string;
  text: string;
  receivedAt: string;
}

export interface FakeSmtp {
  port: number;
  messages: CapturedMail[];
  close(): Promise<void>;
}

/**
 * A local SMTP server that accepts every message and keeps it in memory, so that nodemailer talks
 * real SMTP in development and tests without any mail leaving the machine.
 */
export async function startFakeSmtp(options: { port?: number; host?: string } = {}): Promise<FakeSmtp> {
  const messages: CapturedMail[] = [];
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((mail) => {
          messages.push({
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
            to: session.envelope.rcptTo.map((r) => r.address),
            subject: mail.subject ?? '',
            text: mail.text ?? '',
            receivedAt: new Date().toISOString(),
          });
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  const host = options.host ?? '127.0.0.1';
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, host, () => resolve());
  });
  const address = server.server.address();
  const port = typeof address === 'object' && address ? address.port : 0;
  return {
    port,
    messages,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
