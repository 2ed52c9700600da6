import sharp from 'sharp';
import type { Readable } from 'node:stream';

export const THUMBNAIL_PX = 320;
export const THUMBNAIL_TYPE = 'image/webp';
/** Above any phone camera's sensor; stops a tiny file that unpacks into a huge image. */
export const MAX_PHOTO_MEGAPIXELS = 250;

export interface Thumbnail {
  body: Buffer;
  /** The photo's own size, as it is shown (after its camera orientation). */
  widthPx: number;
  heightPx: number;
}

/**
 * A 320 px WebP thumbnail of a photo, turned upright from its camera orientation. Throws when
 * the bytes are not a readable image, so a damaged photo is refused rather than stored.
 */
export async function makeThumbnail(source: Readable): Promise<Thumbnail> {
  const base = sharp({ failOn: 'error', limitInputPixels: MAX_PHOTO_MEGAPIXELS * 1_000_000 });
  const meta = base.clone().metadata();
  const thumb = base
    .clone()
    .rotate()
    .resize(THUMBNAIL_PX, THUMBNAIL_PX, { fit: 'inside', withoutEnlargement: true })
    .webp({ quality: 78 })
    .toBuffer();
  source.on('error', (err) => base.destroy(err));
  source.pipe(base);
  const [info, body] = await Promise.all([meta, thumb]);
  const turned = (info.orientation ?? 1) >= 5;
  const width = info.width ?? 0;
  const height = info.height ?? 0;
  return { body, widthPx: turned ? height : width, heightPx: turned ? width : height };
}
