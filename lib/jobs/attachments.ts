/**
 * Photos (nameplate, damage) are stored in the database, not on local disk, so any app instance can
 * serve them. Size and type are checked on the server from the bytes themselves, not the browser's word.
 */
import { db } from '@/lib/db/client';
import type { AttachmentKind } from '@/lib/db/generated/enums';
import { DomainError } from '@/lib/errors/domain-errors';
import { recordJobEvent } from './job-writes';
import { MAX_PHOTO_BYTES, MAX_PHOTOS_PER_UPLOAD } from './photo-rules';

export { MAX_PHOTO_BYTES, MAX_PHOTOS_PER_UPLOAD } from './photo-rules';

const SIGNATURES: { mime: string; test: (b: Uint8Array) => boolean }[] = [
  { mime: 'image/jpeg', test: (b) => b[0] === 0xff && b[1] === 0xd8 && b[2] === 0xff },
  { mime: 'image/png', test: (b) => b[0] === 0x89 && b[1] === 0x50 && b[2] === 0x4e && b[3] === 0x47 },
  { mime: 'image/webp', test: (b) => String.fromCharCode(...b.slice(8, 12)) === 'WEBP' },
  { mime: 'image/gif', test: (b) => String.fromCharCode(...b.slice(0, 3)) === 'GIF' },
];

export function sniffImageType(bytes: Uint8Array): string | null {
  return SIGNATURES.find((s) => s.test(bytes))?.mime ?? null;
}

export interface PhotoUpload {
  filename: string;
  bytes: Uint8Array;
}

/** Returns a message per rejected file (keyed by file name); an empty object when all are acceptable. */
export function checkPhotos(photos: PhotoUpload[]): Record<string, string> {
  const problems: Record<string, string> = {};
  if (photos.length > MAX_PHOTOS_PER_UPLOAD) problems._count = `At most ${MAX_PHOTOS_PER_UPLOAD} photos at a time.`;
  for (const p of photos) {
    if (p.bytes.byteLength === 0) problems[p.filename] = `${p.filename} is empty (0 bytes); choose the photo again.`;
    else if (p.bytes.byteLength > MAX_PHOTO_BYTES) problems[p.filename] = `${p.filename} is larger than 5 MB; take a smaller photo.`;
    else if (!sniffImageType(p.bytes)) problems[p.filename] = `${p.filename} is not a JPEG, PNG, WebP or GIF image.`;
  }
  return problems;
}

export async function addPhotos(jobId: string, userId: string, kind: AttachmentKind, photos: PhotoUpload[]): Promise<number> {
  const problems = checkPhotos(photos);
  if (Object.keys(problems).length)
    throw new DomainError('invalid', Object.values(problems).join(' '), { photos: Object.values(problems) });
  if (photos.length === 0) return 0;
  return db().$transaction(async (tx) => {
    const job = await tx.job.findUnique({ where: { id: jobId }, select: { id: true } });
    if (!job) throw new DomainError('not-found', 'That job does not exist.');
    for (const p of photos) {
      await tx.attachment.create({
        data: {
          jobId,
          kind,
          filename: p.filename.slice(0, 200),
          mimeType: sniffImageType(p.bytes) ?? 'application/octet-stream',
          sizeBytes: p.bytes.byteLength,
          data: Buffer.from(p.bytes),
          uploadedById: userId,
        },
      });
    }
    await recordJobEvent(tx, {
      jobId,
      userId,
      kind: 'PHOTO',
      message: `Added ${photos.length} ${kind.toLowerCase()} photo${photos.length > 1 ? 's' : ''}.`,
    });
    return photos.length;
  });
}

// An empty file input submits a nameless zero-byte part: that is "no photo", not an empty photo.
export async function photosFromFormData(form: FormData, field = 'photos'): Promise<PhotoUpload[]> {
  const files = form
    .getAll(field)
    .filter((f): f is File => typeof f === 'object' && f !== null && 'arrayBuffer' in f && (f.size > 0 || f.name !== ''));
  return Promise.all(files.map(async (f) => ({ filename: f.name || 'photo', bytes: new Uint8Array(await f.arrayBuffer()) })));
}

/** A stored photo's bytes and type, for the download route (which checks the session first). */
export async function getAttachment(id: string) {
  return db().attachment.findUnique({ where: { id }, select: { data: true, mimeType: true, filename: true } });
}
