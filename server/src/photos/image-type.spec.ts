import { describe, expect, it } from 'vitest';
import { imageTypeOf } from './image-type';

describe('imageTypeOf', () => {
  it('reads the type from the first bytes', () => {
    expect(imageTypeOf(Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0, 0x10]))).toBe('image/jpeg');
    expect(imageTypeOf(Buffer.from('89504e470d0a1a0a0000000d', 'hex'))).toBe('image/png');
    expect(
      imageTypeOf(Buffer.concat([Buffer.from('RIFF'), Buffer.alloc(4), Buffer.from('WEBPVP8 ')])),
    ).toBe('image/webp');
  });

  it('refuses anything else, whatever it is called', () => {
    // A Windows executable starts "MZ" (the PE/COFF DOS stub); an ELF binary with 7F "ELF".
    expect(imageTypeOf(Buffer.from('MZ\x90\x00\x03\x00\x00\x00', 'latin1'))).toBeNull();
    expect(imageTypeOf(Buffer.from('\x7fELF\x02\x01\x01', 'latin1'))).toBeNull();
    expect(imageTypeOf(Buffer.from('GIF89a'))).toBeNull();
    expect(imageTypeOf(Buffer.alloc(0))).toBeNull();
  });
});
