import { DataSource } from 'typeorm';
import { UserEntity } from '../modules/users/user.entity';
import { AuditEventEntity } from '../modules/audit/audit-event.entity';
import { MailMessageEntity } from '../modules/mail/mail-message.entity';
import { EntryEntity } from '../modules/entries/entry.entity';
import { RevisionEntity } from '../modules/entries/revision.entity';
import { ReviewCommentEntity } from '../modules/reviews/review-comment.entity';
import { Foundation1764640000000 } from './migrations/1764640000000-foundation';
import { Curation1764641000000 } from './migrations/1764641000000-curation';
import { Imports1764641500000 } from './migrations/1764641500000-imports';
import { LibrarySearch1764643000000 } from './migrations/1764643000000-library-search';
import { LibrarySearchStored1764643500000 } from './migrations/1764643500000-library-search-stored';
import { AccessKeys1764642000000 } from './migrations/1764642000000-access-keys';

export const entities = [UserEntity, AuditEventEntity, MailMessageEntity, EntryEntity, RevisionEntity, ReviewCommentEntity];
export const migrations = [Foundation1764640000000, Curation1764641000000, Imports1764641500000, AccessKeys1764642000000, LibrarySearch1764643000000, LibrarySearchStored1764643500000];

/** Builds the one DataSource of the API. Schema changes are migrations; `synchronize` stays off. */
export function createDataSource(databaseUrl: string): DataSource {
  return new DataSource({
    type: 'postgres',
    url: databaseUrl,
    entities,
    migrations,
    synchronize: false,
    migrationsRun: false,
    logging: ['error'],
    extra: { max: 10, connectionTimeoutMillis: 5000 },
  });
}
