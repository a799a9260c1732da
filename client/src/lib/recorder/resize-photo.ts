// Photos of a defect: shrunk on the phone so they upload over a weak signal and fit the server's limit.

export const PHOTO_MAX_EDGE_PX = 1600;
export const PHOTO_JPEG_QUALITY = 0.8;

export interface Size {
  width: number;
  height: number;
}

// Fits the longer edge within maxEdgePx, keeping the aspect ratio; never enlarges.
export function fitWithinEdge(size: Size, maxEdgePx: number): Size {
  const longest = Math.max(size.width, size.height);
  if (longest <= maxEdgePx) return { width: size.width, height: size.height };
  const scale = maxEdgePx / longest;
  return {
    width: Math.max(1, Math.round(size.width * scale)),
    height: Math.max(1, Math.round(size.height * scale)),
  };
}

// The browser pieces a resize uses, so tests can stand in for them.
export interface PhotoEnvironment {
  decode(file: Blob): Promise<ImageBitmap>;
  // Draws the bitmap at the given size and encodes it as JPEG.
  encode(bitmap: ImageBitmap, size: Size, quality: number): Promise<Blob>;
}

function browserPhotoEnvironment(): PhotoEnvironment {
  return {
    // The camera's EXIF orientation is applied, so a phone photo is not turned on its side.
    decode: (file) => createImageBitmap(file, { imageOrientation: 'from-image' }),
    async encode(bitmap, size, quality) {
      if (typeof OffscreenCanvas !== 'undefined') {
        const canvas = new OffscreenCanvas(size.width, size.height);
        const context = canvas.getContext('2d');
        if (!context) throw new Error('This browser cannot draw the photo.');
        context.drawImage(bitmap, 0, 0, size.width, size.height);
        return canvas.convertToBlob({ type: 'image/jpeg', quality });
      }
      const canvas = document.createElement('canvas');
      canvas.width = size.width;
      canvas.height = size.height;
      const context = canvas.getContext('2d');
      if (!context) throw new Error('This browser cannot draw the photo.');
      context.drawImage(bitmap, 0, 0, size.width, size.height);
      return new Promise<Blob>((resolve, reject) =>
        canvas.toBlob(
          (blob) => (blob ? resolve(blob) : reject(new Error('This browser cannot encode the photo.'))),
          'image/jpeg',
          quality,
        ),
      );
    },
  };
}

export async function resizePhoto(
  file: Blob,
  maxEdgePx: number = PHOTO_MAX_EDGE_PX,
  quality: number = PHOTO_JPEG_QUALITY,
  environment: PhotoEnvironment = browserPhotoEnvironment(),
): Promise<Blob> {
  const bitmap = await environment.decode(file);
  try {
    const size = fitWithinEdge({ width: bitmap.width, height: bitmap.height }, maxEdgePx);
    return await environment.encode(bitmap, size, quality);
  } finally {
    bitmap.close();
  }
}
