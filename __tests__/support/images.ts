import sharp from 'sharp';

/**
 * Test images made on the fly with sharp, plus files that only pretend to be photos. Every place,
 * camera and person named here is invented.
 */

/** piexifjs has no type declarations; this is the part the helpers use. */
type Rational = [number, number];
type Piexif = {
  ImageIFD: Record<string, number>;
  ExifIFD: Record<string, number>;
  GPSIFD: Record<string, number>;
  dump(exif: Record<string, Record<number, unknown>>): string;
  insert(exif: string, jpeg: string): string;
  GPSHelper: { degToDmsRational(deg: number): Rational[] };
};
// eslint-disable-next-line @typescript-eslint/no-require-imports
const piexif: Piexif = require('piexifjs');

/** Where the GPS-tagged photo claims to be: an invented track in open water. */
export const INVENTED_PLACE = { name: 'Saltmarsh Hollow raceway', latitude: 12.3456, longitude: -45.6789 };
export const CAMERA = { make: 'Quillcam', model: 'QC-7 Trackside' };
/** Text put in the XMP packet and the JPEG comment; none of it may survive processing. */
export const SECRET_NOTE = 'pit-garage-door-code-4471';

/** A colourful RGB picture with a red block in its top-left corner (to check rotation). */
export function rawPicture(width: number, height: number): Buffer {
  const px = Buffer.alloc(width * height * 3);
  for (let y = 0; y < height; y += 1) {
    for (let x = 0; x < width; x += 1) {
      const i = (y * width + x) * 3;
      const mark = x < width / 4 && y < height / 4;
      px[i] = mark ? 255 : (x * 7) % 256;
      px[i + 1] = mark ? 0 : (y * 5) % 256;
      px[i + 2] = mark ? 0 : ((x + y) * 3) % 256;
    }
  }
  return px;
}

export async function plainJpeg(width = 640, height = 480, quality = 90): Promise<Buffer> {
  return sharp(rawPicture(width, height), { raw: { width, height, channels: 3 } }).jpeg({ quality }).toBuffer();
}

/** Inserts an APPn or COM segment right after the SOI marker. */
function withSegment(jpeg: Buffer, marker: number, payload: Buffer): Buffer {
  const header = Buffer.from([0xff, marker, 0, 0]);
  header.writeUInt16BE(payload.length + 2, 2);
  return Buffer.concat([jpeg.subarray(0, 2), header, payload, jpeg.subarray(2)]);
}

function xmpPacket(): Buffer {
  const xml =
    '<?xpacket begin="" id="W5M0MpCehiHzreSzNTczkc9d"?><x:xmpmeta xmlns:x="adobe:ns:meta/"><rdf:RDF xmlns:rdf="http://www.w3.org/1999/02/22-rdf-syntax-ns#">' +
    `<rdf:Description xmlns:dc="http://purl.org/dc/elements/1.1/"><dc:description>${SECRET_NOTE}</dc:description></rdf:Description>` +
    '</rdf:RDF></x:xmpmeta><?xpacket end="w"?>';
  return Buffer.concat([Buffer.from('http://ns.adobe.com/xap/1.0/\0', 'latin1'), Buffer.from(xml)]);
}

/**
 * A JPEG as a phone would send it: EXIF with GPS position, camera and time (inserted with
 * piexifjs), an XMP packet and a comment segment. `orientation` 6 means "rotate 90° clockwise
 * to view", so a 640×480 file is a 480×640 photo.
 */
export async function jpegWithGps(opts: { width?: number; height?: number; orientation?: number } = {}): Promise<Buffer> {
  const base = await plainJpeg(opts.width ?? 640, opts.height ?? 480);
  const { latitude, longitude } = INVENTED_PLACE;
  const exif = piexif.dump({
    '0th': {
      [piexif.ImageIFD.Make]: CAMERA.make,
      [piexif.ImageIFD.Model]: CAMERA.model,
      [piexif.ImageIFD.Orientation]: opts.orientation ?? 1,
    },
    Exif: { [piexif.ExifIFD.DateTimeOriginal]: '2026:03:14 09:26:53' },
    GPS: {
      [piexif.GPSIFD.GPSLatitudeRef]: latitude >= 0 ? 'N' : 'S',
      [piexif.GPSIFD.GPSLatitude]: piexif.GPSHelper.degToDmsRational(Math.abs(latitude)),
      [piexif.GPSIFD.GPSLongitudeRef]: longitude >= 0 ? 'E' : 'W',
      [piexif.GPSIFD.GPSLongitude]: piexif.GPSHelper.degToDmsRational(Math.abs(longitude)),
    },
  });
  const tagged = Buffer.from(piexif.insert(exif, base.toString('binary')), 'binary');
  const withXmp = withSegment(tagged, 0xe1, xmpPacket());
  return withSegment(withXmp, 0xfe, Buffer.from(`shot at ${INVENTED_PLACE.name}, ${SECRET_NOTE}`));
}

export async function pngImage(opts: { width?: number; height?: number; alpha?: boolean } = {}): Promise<Buffer> {
  const width = opts.width ?? 300;
  const height = opts.height ?? 200;
  const img = sharp(rawPicture(width, height), { raw: { width, height, channels: 3 } });
  return (opts.alpha ? img.ensureAlpha(0) : img).png().toBuffer();
}

export async function webpImage(width = 500, height = 500): Promise<Buffer> {
  return sharp(rawPicture(width, height), { raw: { width, height, channels: 3 } }).webp().toBuffer();
}

export async function avifImage(width = 320, height = 240): Promise<Buffer> {
  return sharp(rawPicture(width, height), { raw: { width, height, channels: 3 } }).avif().toBuffer();
}

export async function gifImage(): Promise<Buffer> {
  return sharp(rawPicture(40, 30), { raw: { width: 40, height: 30, channels: 3 } }).gif().toBuffer();
}

/**
 * A flat sRGB colour saved as Display P3 with its ICC profile: the file's numbers differ from the
 * colour, and only a viewer that applies the profile shows `srgb`.
 */
export async function displayP3Jpeg(srgb: { r: number; g: number; b: number }): Promise<Buffer> {
  return sharp({ create: { width: 64, height: 64, channels: 3, background: srgb } }).withIccProfile('p3').jpeg({ quality: 100 }).toBuffer();
}

/** Random pixels compress badly: a JPEG of a few hundred KB from a small picture. */
export async function noisyJpeg(width = 800, height = 800): Promise<Buffer> {
  return sharp({ create: { width, height, channels: 3, background: '#808080', noise: { type: 'gaussian', mean: 128, sigma: 60 } } })
    .jpeg({ quality: 100 })
    .toBuffer();
}

/**
 * A real, tiny JPEG whose frame header (SOF) is rewritten to claim `width`×`height`: a
 * decompression bomb as far as any header reader can tell.
 */
export async function jpegClaimingSize(width: number, height: number): Promise<Buffer> {
  const jpeg = Buffer.from(await plainJpeg(16, 16));
  for (let i = 2; i + 9 < jpeg.length; ) {
    const marker = jpeg[i + 1];
    if (marker >= 0xc0 && marker <= 0xc2) {
      jpeg.writeUInt16BE(height, i + 5);
      jpeg.writeUInt16BE(width, i + 7);
      return jpeg;
    }
    i += 2 + jpeg.readUInt16BE(i + 2);
  }
  throw new Error('no SOF marker found');
}

/** A valid JPEG with a web page appended: opens as a photo, and as a page if sniffed as HTML. */
export async function jpegWithHtmlAppended(): Promise<Buffer> {
  return Buffer.concat([await plainJpeg(64, 48), Buffer.from('<html><body><script>alert(document.cookie)</script></body></html>')]);
}

/** JPEG magic bytes, then nothing but a web page. */
export function jpegMagicThenHtml(): Buffer {
  return Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), Buffer.from('<!doctype html><html><script>alert(1)</script></html>')]);
}

export const HTML_PAGE = Buffer.from('<!doctype html>\n<html><body><script>fetch("/api/me")</script></body></html>\n');
export const SVG_DRAWING = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>alert(1)</script></svg>');

/** The start of a HEVC-compressed HEIF ("HEIC") file: brand heic, as file-type sees it. */
export function heicHeader(): Buffer {
  const ftyp = Buffer.concat([Buffer.from([0, 0, 0, 0x18]), Buffer.from('ftypheic\0\0\0\0mif1heic', 'latin1')]);
  return Buffer.concat([ftyp, Buffer.alloc(256)]);
}

/**
 * The marker bytes of a JPEG's segments before the image data: 0xE0 JFIF, 0xE1 EXIF/XMP, 0xE2
 * ICC, 0xED IPTC, 0xFE comment, 0xDB/0xC4 tables, 0xC0–0xC2 frame. Format: ITU-T T.81, annex B.
 */
export function jpegMarkers(jpeg: Buffer): number[] {
  if (jpeg[0] !== 0xff || jpeg[1] !== 0xd8) throw new Error('not a JPEG');
  const markers: number[] = [];
  for (let i = 2; i + 4 <= jpeg.length && jpeg[i] === 0xff; i += 2 + jpeg.readUInt16BE(i + 2)) {
    if (jpeg[i + 1] === 0xda) break;
    markers.push(jpeg[i + 1]);
  }
  return markers;
}
