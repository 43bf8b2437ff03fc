import { EntitySchema } from 'typeorm';

export type MailStatus = 'pending' | 'sent' | 'failed';

/** The outbox: a mail is written here in the same transaction as the change it reports, then sent. */
export interface MailMessageRow {
  id: string;
  createdAt: Date;
  toAddress: string;
  subject: string;
  bodyText: string;
  status: MailStatus;
  attempts: number;
  lastError: string | null;
  nextAttemptAt: Date;
  sentAt: Date | null;
}

export const MailMessageEntity = new EntitySchema<MailMessageRow>({
  name: 'MailMessage',
  tableName: 'mail_messages',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    createdAt: { type: 'timestamptz', name: 'created_at', createDate: true },
    toAddress: { type: 'varchar', name: 'to_address' },
    subject: { type: 'varchar' },
    bodyText: { type: 'text', name: 'body_text' },
    status: { type: 'varchar' },
    attempts: { type: 'int' },
    lastError: { type: 'text', name: 'last_error', nullable: true },
    nextAttemptAt: { type: 'timestamptz', name: 'next_attempt_at' },
    sentAt: { type: 'timestamptz', name: 'sent_at', nullable: true },
  },
});
