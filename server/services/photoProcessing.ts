import FileType from 'file-type';
import sharp, { type Metadata, type Raw } from 'sharp';
import { ApiError } from '../errors';

/** Stable codes the client may branch on (beside the generic ones in shared/types/errors). */
export const PHOTO_ERRORS = {
  empty: 'photo_empty',
  tooLarge: 'photo_too_large',
  typeNotAllowed: 'photo_type_not_allowed',
  tooManyPixels: 'photo_too_many_pixels',
  unreadable: 'photo_unreadable',
} as const;
const E = PHOTO_ERRORS;

/** Longest side of each stored variant, in pixels. */
export const DISPLAY_MAX_SIDE = 1600;
export const THUMB_MAX_SIDE = 400;

/**
 * Both variants are baseline-compatible JPEG (mozjpeg): every browser, mail client, photo viewer
 * and native image view opens it, and racers save and forward setup photos. WebP would be about a
 * quarter smaller at these sizes, which does not outweigh "opens everywhere" for a few photos
 * per setup. Alpha (PNG, WebP) is flattened onto white since JPEG has none.
 */
export const PHOTO_OUTPUT = { contentType: 'image/jpeg', ext: 'jpg' } as const;

export type PhotoLimits = { maxBytes: number; maxPixels: number };
export type EncodedVariant = { body: Buffer; width: number; height: number; bytes: number };
export type ProcessedPhoto = {
  contentType: typeof PHOTO_OUTPUT.contentType;
  ext: typeof PHOTO_OUTPUT.ext;
  display: EncodedVariant;
  thumb: EncodedVariant;
  /** What was uploaded, as detected from its bytes (never from its name or declared type). */
  source: { format: 'jpeg' | 'png' | 'webp' | 'avif'; width: number; height: number };
};

/** Names a racer recognises for the types people most often pick by mistake. */
const REFUSED_NAMES: Record<string, string> = {
  gif: 'a GIF',
  bmp: 'a BMP image',
  tif: 'a TIFF image',
  ico: 'an icon file',
  psd: 'a layered image (PSD)',
  jxl: 'a JPEG XL image',
  pdf: 'a PDF document',
  xml: 'an XML or SVG drawing',
  zip: 'a ZIP archive',
  mp4: 'a video',
  mov: 'a video',
};

/** "That file is a GIF", or the best honest description of an unrecognised file. */
function describeRefusedType(buffer: Buffer, ext: string | undefined): string {
  if (ext) return `That file is ${REFUSED_NAMES[ext] ?? `a ${ext.toUpperCase()} file`}`;
  // file-type recognises no text formats: a leading "<" is HTML or SVG, whatever the name says.
  if (/^\s*</.test(buffer.subarray(0, 64).toString('latin1').replace(/^\uFEFF|^\xEF\xBB\xBF/, ''))) {
    return 'That file is a web page or drawing (text), not a photo';
  }
  return 'We could not tell what kind of file that is';
}

/**
 * Active web content anywhere in the bytes. Camera metadata never uses these tags (XMP is
 * x:xmpmeta/rdf), and by chance in compressed pixel data the shortest ones (`<html `, `<body>`)
 * appear about once in 10^12 positions: one false refusal in some 100,000 photos of 12 MB.
 * `<svg` is left out on purpose: three letters would make that about one in 1,400.
 */
function looksLikeMarkup(buffer: Buffer): boolean {
  return /<(script|html|body|iframe|object|embed|!doctype|\?php)[\s>\/]/i.test(buffer.toString('latin1'));
}

/** 14.2 MB, or 180 KB under one megabyte: sizes as a racer reads them. */
export function formatBytes(bytes: number): string {
  const mb = bytes / (1024 * 1024);
  return mb >= 1 ? `${Number(mb.toFixed(1))} MB` : `${Math.ceil(bytes / 1024)} KB`;
}

function formatPixels(pixels: number): string {
  return pixels >= 1_000_000 ? `${Number((pixels / 1_000_000).toFixed(1))} megapixels` : `${pixels.toLocaleString('en')} pixels`;
}

/** file-type's answer → the sharp format the same bytes must decode as. */
const ACCEPTED: Record<string, Metadata['format']> = { jpg: 'jpeg', png: 'png', webp: 'webp', avif: 'heif', heic: 'heif' };

/** Sniffs the real type from the magic bytes; refuses everything but JPEG, PNG, WebP and AVIF. */
async function detectType(buffer: Buffer): Promise<string> {
  const detected = await FileType.fromBuffer(buffer);
  if (!detected || !ACCEPTED[detected.ext]) {
    throw new ApiError(415, E.typeNotAllowed, `${describeRefusedType(buffer, detected?.ext)}; upload a JPEG, PNG or WebP photo.`, {
      detected: detected?.ext ?? null,
    });
  }
  // Bytes of a web page inside an image (a polyglot) would be harmless once re-encoded, but a
  // file built that way is never an honest photo, so it is refused outright.
  if (looksLikeMarkup(buffer)) {
    throw new ApiError(415, E.typeNotAllowed, 'That file looks like a photo but has web page code hidden inside it; export the photo again as a JPEG, PNG or WebP and upload that.', {
      detected: detected.ext,
    });
  }
  return detected.ext;
}

function unreadable(): ApiError {
  return new ApiError(400, E.unreadable, 'We could not read that photo; it may be damaged or only partly uploaded. Export it again and retry.');
}

function tooManyPixels(width: number, height: number, maxPixels: number): ApiError {
  return new ApiError(
    413,
    E.tooManyPixels,
    `That photo is ${width} × ${height} pixels (${formatPixels(width * height)}); the limit is ${formatPixels(maxPixels)}. Resize it and try again.`,
    { width, height, maxPixels },
  );
}

const HEIC_MESSAGE =
  'That photo is in HEIC format, which we cannot read yet; set the camera to save JPEG ("most compatible") or export the photo as JPEG, then upload it again.';

/**
 * Reads the header only (no pixel decoding) and applies the decompression-bomb guard with the
 * real dimensions in the message. sharp's own limitInputPixels would refuse in metadata() too,
 * but without saying how big the image is; the decode below still passes it as a second lock.
 */
async function checkHeader(buffer: Buffer, ext: string, limits: PhotoLimits): Promise<ProcessedPhoto['source']> {
  let meta: Metadata;
  try {
    meta = await sharp(buffer, { limitInputPixels: false }).metadata();
  } catch {
    throw ext === 'heic' ? new ApiError(415, E.typeNotAllowed, HEIC_MESSAGE, { detected: 'heic' }) : unreadable();
  }
  // sharp's prebuilt libvips decodes AV1-compressed HEIF (AVIF) but has no HEVC decoder, so HEIC
  // photos cannot be read here, whatever brand their header names.
  if (meta.format === 'heif' && meta.compression !== 'av1') throw new ApiError(415, E.typeNotAllowed, HEIC_MESSAGE, { detected: 'heic' });
  if (meta.format !== ACCEPTED[ext] || !meta.width || !meta.height) throw unreadable();
  if (meta.width * meta.height > limits.maxPixels) throw tooManyPixels(meta.width, meta.height, limits.maxPixels);
  const format = meta.format === 'heif' ? 'avif' : (meta.format as 'jpeg' | 'png' | 'webp');
  return { format, width: meta.width, height: meta.height };
}

async function encode(pixels: Buffer, raw: Raw, maxSide: number, quality: number): Promise<EncodedVariant> {
  // No withMetadata()/keepMetadata(): sharp writes no EXIF, XMP, IPTC, ICC or comment segments.
  const { data, info } = await sharp(pixels, { raw })
    .resize({ width: maxSide, height: maxSide, fit: 'inside', withoutEnlargement: true })
    .jpeg({ quality, mozjpeg: true })
    .toBuffer({ resolveWithObject: true });
  return { body: data, width: info.width, height: info.height, bytes: data.length };
}

/**
 * Decodes once: upright (EXIF orientation applied), at most display size, no alpha, converted to
 * sRGB through any embedded ICC profile (wide-gamut phone photos keep their colours even though
 * the profile itself is not written out).
 */
async function decodeUpright(buffer: Buffer, limits: PhotoLimits): Promise<{ data: Buffer; raw: Raw }> {
  try {
    const { data, info } = await sharp(buffer, { limitInputPixels: limits.maxPixels })
      .autoOrient()
      .resize({ width: DISPLAY_MAX_SIDE, height: DISPLAY_MAX_SIDE, fit: 'inside', withoutEnlargement: true })
      .flatten({ background: '#ffffff' })
      .toColourspace('srgb')
      .raw()
      .toBuffer({ resolveWithObject: true });
    return { data, raw: { width: info.width, height: info.height, channels: info.channels } };
  } catch (err) {
    if (err instanceof Error && /pixel limit/i.test(err.message)) {
      throw new ApiError(413, E.tooManyPixels, `That photo has more than ${formatPixels(limits.maxPixels)}, the limit. Resize it and try again.`, {
        maxPixels: limits.maxPixels,
      });
    }
    throw unreadable();
  }
}

/**
 * Checks an uploaded file and re-encodes it into a display variant (longest side 1600 px) and a
 * thumbnail (400 px), upright, in sRGB, and without any metadata segment (EXIF with GPS, XMP,
 * IPTC, ICC, comments). The original bytes are never kept. Throws ApiError with a PHOTO_ERRORS code.
 */
export async function processPhoto(buffer: Buffer, limits: PhotoLimits): Promise<ProcessedPhoto> {
  if (buffer.length === 0) throw new ApiError(400, E.empty, 'That file is empty; choose a photo and try again.');
  if (buffer.length > limits.maxBytes) {
    throw new ApiError(413, E.tooLarge, `That photo is ${formatBytes(buffer.length)}; the limit is ${formatBytes(limits.maxBytes)}. Export it smaller and try again.`, {
      bytes: buffer.length,
      maxBytes: limits.maxBytes,
    });
  }
  const ext = await detectType(buffer);
  const source = await checkHeader(buffer, ext, limits);
  const { data, raw } = await decodeUpright(buffer, limits);
  const [display, thumb] = await Promise.all([encode(data, raw, DISPLAY_MAX_SIDE, 82), encode(data, raw, THUMB_MAX_SIDE, 78)]);
  return { ...PHOTO_OUTPUT, display, thumb, source };
}
