// What an uploaded photo really is, judged by its bytes (sharp reads the file's own header,
// never its name or the browser's type), and the stored forms: the photo re-encoded in its
// own format with its orientation applied and its metadata (camera, GPS) dropped, and a
// small JPEG thumbnail.
import sharp from 'sharp';
import { HttpError } from '../../http/http-error.ts';

export const ACCEPTED = { jpeg: { type: 'image/jpeg', ext: 'jpg' }, png: { type: 'image/png', ext: 'png' }, webp: { type: 'image/webp', ext: 'webp' } } as const;
/** Longest side of a thumbnail, px. */
export const THUMB_PX = 320;
/** Larger images are refused before decoding (a decompression bomb guard): 50 megapixels. */
const MAX_PIXELS = 50_000_000;

export interface CheckedPhoto {
  body: Buffer;
  contentType: string;
  ext: string;
  widthPx: number;
  heightPx: number;
  thumb: Buffer;
}

const unsupported = () =>
  new HttpError(415, 'unsupported_photo', 'Photo must be a JPEG, PNG or WebP image; this file is something else.', { file: 'Photo must be a JPEG, PNG or WebP image' });

export async function checkPhoto(input: Buffer): Promise<CheckedPhoto> {
  let format: string | undefined;
  try {
    format = (await sharp(input, { limitInputPixels: MAX_PIXELS }).metadata()).format;
  } catch {
    throw unsupported();
  }
  if (format !== 'jpeg' && format !== 'png' && format !== 'webp') throw unsupported();
  const kind = ACCEPTED[format];
  try {
    const upright = () => sharp(input, { limitInputPixels: MAX_PIXELS }).rotate();
    const encoded = format === 'jpeg' ? upright().jpeg({ quality: 90 }) : format === 'png' ? upright().png() : upright().webp({ quality: 90 });
    const { data, info } = await encoded.toBuffer({ resolveWithObject: true });
    const thumb = await upright().resize(THUMB_PX, THUMB_PX, { fit: 'inside', withoutEnlargement: true }).flatten({ background: '#ffffff' }).jpeg({ quality: 80 }).toBuffer();
    return { body: data, contentType: kind.type, ext: kind.ext, widthPx: info.width, heightPx: info.height, thumb };
  } catch {
    // A header that looks right over a broken body.
    throw unsupported();
  }
}
