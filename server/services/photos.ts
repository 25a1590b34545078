import { randomUUID } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import multer from 'multer';
import type { Config } from '../config';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import type { Photo } from '../models/Photo';
import { newStorageKey, STORAGE_KEY_PATTERN, type BlobStorage } from '../storage';
import { formatBytes, processPhoto } from './photoProcessing';

export type PhotoDeps = { db: Database; storage: BlobStorage; config: Pick<Config, 'photos'> };
/** The part of a multer file the service reads. Name and declared type are never trusted. */
export type UploadedPhotoFile = { buffer: Buffer; originalname: string; mimetype: string };

/** Where GET /api/photos/:key is mounted; photo URLs are this plus a key-derived id. */
export const PHOTO_URL_PREFIX = '/api/photos/';
/** Storage folders: `p/` display variants, `t/` thumbnails. */
const DISPLAY_FOLDER = 'p';
const THUMB_FOLDER = 't';
const CAPTION_MAX = 200;

/**
 * Checks, re-encodes and stores an uploaded photo for `ownerId`: the display variant and the
 * thumbnail under fresh random keys, then the `photos` row. If anything after the first write
 * fails, both stored files are removed again before the error propagates.
 * Throws ApiError (photo_* codes) for a file that is not an acceptable photo.
 */
export async function storeUploadedPhoto(
  deps: PhotoDeps,
  ownerId: number,
  file: UploadedPhotoFile,
  options: { caption?: string } = {},
): Promise<Photo> {
  const caption = (options.caption ?? '').trim();
  if (caption.length > CAPTION_MAX) throw ApiError.validation({ caption: `Keep the caption under ${CAPTION_MAX} characters.` });
  // file.originalname and file.mimetype are deliberately ignored: the bytes decide the type.
  const processed = await processPhoto(file.buffer, deps.config.photos);
  // One random id for both variants: knowing a thumbnail's URL grants nothing its photo's does not.
  const id = randomUUID();
  const storageKey = newStorageKey(DISPLAY_FOLDER, processed.ext, id);
  const thumbKey = newStorageKey(THUMB_FOLDER, processed.ext, id);
  try {
    await Promise.all([
      deps.storage.put(storageKey, processed.display.body, processed.contentType),
      deps.storage.put(thumbKey, processed.thumb.body, processed.contentType),
    ]);
    return await photoModel(deps.db).create({
      ownerId,
      storageKey,
      thumbKey,
      contentType: processed.contentType,
      width: processed.display.width,
      height: processed.display.height,
      bytes: processed.display.bytes,
      caption,
    });
  } catch (err) {
    await Promise.allSettled([deps.storage.delete(storageKey), deps.storage.delete(thumbKey)]);
    throw err;
  }
}

/**
 * Deletes the row first, then both files. If a file deletion then fails, the error propagates and
 * the file is left orphaned: unreferenced and unguessable, never served, which beats a row
 * pointing at a missing file.
 */
export async function deletePhoto(deps: Pick<PhotoDeps, 'storage'>, photo: Photo): Promise<void> {
  await photo.destroy();
  await Promise.all([deps.storage.delete(photo.storageKey), deps.storage.delete(photo.thumbKey)]);
}

/** The Photo model registered on this database (server/models/index.ts registers it). */
function photoModel(db: Database): typeof Photo {
  const model = db.sequelize.models.Photo;
  if (!model) throw new Error('the Photo model is not registered on this database (server/models/index.ts)');
  return model as typeof Photo;
}

/** `p/<uuid>.jpg` → `p-<uuid>.jpg`: one URL path segment, reversible. */
function urlIdForKey(key: string): string {
  return key.replace('/', '-');
}

/** The storage key an URL id stands for, or null when it cannot be one of ours. */
export function storageKeyForUrlId(urlId: string): string | null {
  const key = urlId.replace('-', '/');
  return STORAGE_KEY_PATTERN.test(key) ? key : null;
}

/** Public URLs of both variants, built from the random keys (never the sequential id). */
export function photoUrls(photo: Pick<Photo, 'storageKey' | 'thumbKey'>): { url: string; thumbUrl: string } {
  return { url: PHOTO_URL_PREFIX + urlIdForKey(photo.storageKey), thumbUrl: PHOTO_URL_PREFIX + urlIdForKey(photo.thumbKey) };
}

/** The photo a URL id points at, with the key of the variant asked for; null for anything else. */
export async function findPhotoByUrlId(db: Database, urlId: string): Promise<{ photo: Photo; key: string } | null> {
  const key = storageKeyForUrlId(urlId);
  if (!key) return null;
  const folder = key.slice(0, key.indexOf('/'));
  if (folder !== DISPLAY_FOLDER && folder !== THUMB_FOLDER) return null;
  const photo = await photoModel(db).findOne({ where: folder === DISPLAY_FOLDER ? { storageKey: key } : { thumbKey: key } });
  return photo ? { photo, key } : null;
}

/** multer's refusals (see multer/lib/multer-error.js) in our words and codes. */
function fromMulterError(err: unknown, maxBytes: number): ApiError {
  const code = err instanceof multer.MulterError ? err.code : null;
  switch (code) {
    case 'LIMIT_FILE_SIZE':
      return new ApiError(413, 'photo_too_large', `That photo is larger than the ${formatBytes(maxBytes)} limit. Export it smaller and try again.`, { maxBytes });
    case 'LIMIT_FILE_COUNT':
      return new ApiError(400, 'photo_too_many_files', 'Upload one photo at a time.');
    case 'LIMIT_UNEXPECTED_FILE':
      return new ApiError(400, 'photo_unexpected_field', 'Send one photo, in the form field named "photo".');
    case 'LIMIT_PART_COUNT':
    case 'LIMIT_FIELD_COUNT':
    case 'LIMIT_FIELD_KEY':
    case 'LIMIT_FIELD_VALUE':
      return new ApiError(400, 'upload_too_many_fields', 'The upload had too many or too long form fields.');
    default:
      // Anything else multer or its parser reports is a malformed or interrupted request body.
      return new ApiError(400, 'upload_malformed', 'The upload could not be read; please try again.');
  }
}

/**
 * multer for one photo in the field `photo`, held in memory (it is re-encoded before anything is
 * stored) and capped at config.photos.maxBytes, with a few small text fields (e.g. a caption).
 * Errors become ApiError; a request without a file passes through, see requireUploadedPhoto.
 */
export function photoUploadMiddleware(config: Pick<Config, 'photos'>): RequestHandler {
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: config.photos.maxBytes, files: 1, fields: 5, fieldSize: 4_000, parts: 6 },
  }).single('photo');
  return (req, res, next) => {
    upload(req, res, (err?: unknown) => next(err ? fromMulterError(err, config.photos.maxBytes) : undefined));
  };
}

/** The uploaded photo of a request that went through photoUploadMiddleware, or a 400. */
export function requireUploadedPhoto(req: Request): UploadedPhotoFile {
  if (!req.file) throw new ApiError(400, 'photo_missing', 'Choose a photo to upload.');
  return req.file;
}
