import { describe, expect, it } from 'vitest';
import { Jimp } from 'jimp';
import { photoPixels } from '@/lib/uploads/pixels';

// The files are written by jimp's encoders (jpeg-js, pngjs), an implementation independent of the
// header reader under test.
describe('photoPixels reads the size from the header alone', () => {
  it('matches the encoder for JPEG and PNG of odd sizes', async () => {
    for (const [w, h] of [
      [1, 1],
      [37, 23],
      [640, 480],
      [1201, 77],
    ]) {
      const image = new Jimp({ width: w, height: h, color: 0x336699ff });
      expect(photoPixels(await image.getBuffer('image/jpeg')), `jpeg ${w}×${h}`).toEqual({ width: w, height: h });
      expect(photoPixels(await image.getBuffer('image/png')), `png ${w}×${h}`).toEqual({ width: w, height: h });
    }
  });

  it('steps over segments before the frame header (an EXIF block) and fill bytes', async () => {
    const jpeg = await new Jimp({ width: 300, height: 200, color: 0x000000ff }).getBuffer('image/jpeg');
    // ISO/IEC 10918-1 B.1.1.2: any marker may be preceded by 0xFF fill bytes; APP1 carries EXIF.
    const app1 = Buffer.concat([Buffer.from([0xff, 0xff, 0xe1, 0x00, 0x0a]), Buffer.from('Exif\0\0ab', 'latin1')]);
    const withExif = Buffer.concat([jpeg.subarray(0, 2), app1, jpeg.subarray(2)]);
    expect(photoPixels(withExif)).toEqual({ width: 300, height: 200 });
  });

  it('answers null for a header it cannot read', async () => {
    const jpeg = await new Jimp({ width: 30, height: 20, color: 0x000000ff }).getBuffer('image/jpeg');
    expect(photoPixels(jpeg.subarray(0, 20))).toBeNull();
    expect(photoPixels(Buffer.from('%PDF-1.7'))).toBeNull();
    expect(photoPixels(new Uint8Array(0))).toBeNull();
  });
});
