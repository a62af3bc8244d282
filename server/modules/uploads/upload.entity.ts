import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { UPLOAD_KINDS } from '../../../shared/schemas/api.schema.js';
import { Workshop } from '../workshops/workshop.entity.js';

/**
 * A file a member uploaded. The bytes live in the storage (server/storage) under `storageKey`; the type
 * is the one sniffed from the content, never the name's.
 */
export const Upload = defineEntity({
  name: 'Upload',
  tableName: 'uploads',
  indexes: [{ properties: ['workshop', 'subjectType', 'subjectId'] }],
  properties: {
    id: p.integer().primary().autoincrement(),
    workshop: p.manyToOne(Workshop).deleteRule('cascade'),
    kind: p.enum([...UPLOAD_KINDS]),
    /** What it is attached to, e.g. 'build' and the build's id. */
    subjectType: p.string().length(32).nullable(),
    subjectId: p.integer().nullable(),
    originalName: p.string().length(200),
    storageKey: p.string().length(200).unique(),
    contentType: p.string().length(100),
    sizeBytes: p.integer(),
    sha256: p.string().length(64),
    /** Parsed rows of a drivers' parameters CSV (DriverParamsDto[]), null otherwise. */
    parsed: p.json<unknown>().nullable(),
    uploadedBy: p.string().length(254),
    createdAt: p.datetime().onCreate(() => new Date()),
  },
});
export type Upload = InferEntity<typeof Upload>;
