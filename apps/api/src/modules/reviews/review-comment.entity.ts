import { EntitySchema } from 'typeorm';

export interface ReviewCommentRow {
  id: string;
  revisionId: string;
  parentId: string | null;
  authorId: string;
  body: string;
  kind: 'comment' | 'decision';
  createdAt: Date;
}

export const ReviewCommentEntity = new EntitySchema<ReviewCommentRow>({
  name: 'ReviewComment',
  tableName: 'review_comments',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    revisionId: { type: 'uuid', name: 'revision_id' },
    parentId: { type: 'uuid', name: 'parent_id', nullable: true },
    authorId: { type: 'uuid', name: 'author_id' },
    body: { type: 'text' },
    kind: { type: 'varchar' },
    createdAt: { type: 'timestamptz', name: 'created_at', createDate: true },
  },
});
