import { z } from 'zod';
import { startFakeOAuth } from './fake-oauth';
import { startFakeSmtp } from './fake-smtp';

const env = z
  .object({
    FAKE_OAUTH_PORT: z.coerce.number().int().min(0).max(65535).default(8081),
    FAKE_SMTP_PORT: z.coerce.number().int().min(0).max(65535).default(2525),
  })
  .parse(process.env);

const smtp = await startFakeSmtp({ port: env.FAKE_SMTP_PORT });
const oauth = await startFakeOAuth({ port: env.FAKE_OAUTH_PORT, mailbox: smtp.messages });
console.log(`ionfolio fakes: OAuth stand-in at ${oauth.url}, SMTP on 127.0.0.1:${smtp.port} (inbox at ${oauth.url}/_mail)`);

const stop = async () => {
  await Promise.all([oauth.close(), smtp.close()]);
  process.exit(0);
};
process.on('SIGINT', () => void stop());
process.on('SIGTERM', () => void stop());
