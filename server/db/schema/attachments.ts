import { bigint, boolean, index, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import type { SpectrumData, SpectrumPreview } from '../../../shared/schemas/attachments';
import { pages } from './notebooks';
import { users } from './users';

/** The parsed spectrum kept with the file: full data for the plot, a preview for thumbnails. */
export type StoredSpectrum = SpectrumData & { preview: SpectrumPreview };

/**
 * Files attached to a page. The bytes live in object storage under `storageKey` (ours, never the
 * user's file name); the SHA-256 taken while streaming is what signatures cover.
 */
export const attachments = pgTable(
  'attachments',
  {
    id: uuid('id').primaryKey(),
    pageId: uuid('page_id')
      .notNull()
      .references(() => pages.id),
    uploaderId: uuid('uploader_id')
      .notNull()
      .references(() => users.id),
    originalName: text('original_name').notNull(),
    displayName: text('display_name').notNull(),
    size: bigint('size', { mode: 'number' }).notNull(),
    mediaType: text('media_type').notNull(),
    sha256: text('sha256').notNull(),
    storageKey: text('storage_key').notNull().unique(),
    spectrum: jsonb('spectrum').$type<StoredSpectrum>(),
    parseError: text('parse_error'),
    /** Uploaded after the page was signed: an addendum, outside the signed record. */
    addendum: boolean('addendum').notNull().default(false),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('attachments_page_created').on(t.pageId, t.createdAt)],
);

export type AttachmentRow = typeof attachments.$inferSelect;
