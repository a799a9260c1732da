import { describe, expect, it, vi } from 'vitest';
import { fitWithinEdge, resizePhoto, type PhotoEnvironment, type Size } from './resize-photo';

function fakeEnvironment(source: Size) {
  const close = vi.fn();
  const bitmap = { ...source, close } as unknown as ImageBitmap;
  const encode = vi.fn((_bitmap: ImageBitmap, size: Size, quality: number) =>
    Promise.resolve(new Blob([`${size.width}x${size.height}@${quality}`], { type: 'image/jpeg' })),
  );
  const environment: PhotoEnvironment = { decode: vi.fn(() => Promise.resolve(bitmap)), encode };
  return { environment, encode, bitmap, close };
}

describe('fitWithinEdge', () => {
  it.each([
    [{ width: 4032, height: 3024 }, 1600, { width: 1600, height: 1200 }],
    [{ width: 3024, height: 4032 }, 1600, { width: 1200, height: 1600 }],
    [{ width: 4000, height: 1000 }, 1600, { width: 1600, height: 400 }],
    [{ width: 1920, height: 1081 }, 1600, { width: 1600, height: 901 }],
    [{ width: 1600, height: 900 }, 1600, { width: 1600, height: 900 }],
    [{ width: 800, height: 600 }, 1600, { width: 800, height: 600 }],
    [{ width: 10000, height: 2 }, 1600, { width: 1600, height: 1 }],
  ])('fits %o within %i px as %o', (size, maxEdge, expected) => {
    expect(fitWithinEdge(size, maxEdge)).toEqual(expected);
  });
});

describe('resizePhoto', () => {
  it('encodes a phone photo at 1600 px on the long edge and quality 0.8 by default', async () => {
    const { environment, encode, bitmap, close } = fakeEnvironment({ width: 4032, height: 3024 });
    const blob = await resizePhoto(new Blob(['raw'], { type: 'image/heic' }), undefined, undefined, environment);
    expect(encode).toHaveBeenCalledWith(bitmap, { width: 1600, height: 1200 }, 0.8);
    expect(blob.type).toBe('image/jpeg');
    expect(await blob.text()).toBe('1600x1200@0.8');
    expect(close).toHaveBeenCalledTimes(1);
  });

  it('never enlarges a small photo and honours the given edge and quality', async () => {
    const { environment, encode } = fakeEnvironment({ width: 640, height: 480 });
    await resizePhoto(new Blob(['raw']), 1024, 0.6, environment);
    expect(encode).toHaveBeenCalledWith(expect.anything(), { width: 640, height: 480 }, 0.6);
  });

  it('releases the decoded bitmap when encoding fails', async () => {
    const { environment, close } = fakeEnvironment({ width: 2000, height: 2000 });
    environment.encode = () => Promise.reject(new Error('This browser cannot encode the photo.'));
    await expect(resizePhoto(new Blob(['raw']), 1600, 0.8, environment)).rejects.toThrow('cannot encode');
    expect(close).toHaveBeenCalledTimes(1);
  });
});
