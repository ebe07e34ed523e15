import "server-only";
import { join } from "node:path";
import sharp from "sharp";

export interface PhotoCopy {
  name: "thumb.webp" | "web.webp";
  path: string;
  width: number;
  height: number;
  sizeBytes: number;
}

const COPIES = [
  { name: "thumb.webp", maxSide: 320, quality: 72 },
  { name: "web.webp", maxSide: 1600, quality: 80 },
] as const;

/**
 * A WebP thumbnail and a web-sized copy of a photo, turned upright by its EXIF orientation.
 * sharp writes no metadata unless asked, so location, camera and every other EXIF field stay
 * only in the original, which is kept byte for byte.
 */
export async function makePhotoCopies(
  original: string,
  folder: string,
): Promise<{ width: number; height: number; copies: PhotoCopy[] }> {
  const upright = await sharp(original, { failOn: "error", limitInputPixels: 100_000_000 })
    .rotate()
    .toBuffer({ resolveWithObject: true });
  const copies: PhotoCopy[] = [];
  for (const copy of COPIES) {
    const path = join(folder, copy.name);
    const info = await sharp(upright.data)
      .resize(copy.maxSide, copy.maxSide, { fit: "inside", withoutEnlargement: true })
      .webp({ quality: copy.quality })
      .toFile(path);
    copies.push({
      name: copy.name,
      path,
      width: info.width,
      height: info.height,
      sizeBytes: info.size,
    });
  }
  return { width: upright.info.width, height: upright.info.height, copies };
}
