import { describe, expect, it } from 'vitest';
import { sniffType } from './files';

const bytes = (...xs: number[]) => new Uint8Array([...xs, ...new Array(16).fill(0)]);

describe('upload type sniffing (magic numbers, never the name)', () => {
  it.each([
    ['JPEG', bytes(0xff, 0xd8, 0xff, 0xe0), 'image/jpeg'],
    ['PNG', bytes(0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a), 'image/png'],
    ['WebP', bytes(0x52, 0x49, 0x46, 0x46, 1, 2, 3, 4, 0x57, 0x45, 0x42, 0x50), 'image/webp'],
    ['PDF', new TextEncoder().encode('%PDF-1.7\n'), 'application/pdf'],
  ])('knows %s', (_name, b, mime) => {
    expect(sniffType(b)).toBe(mime);
  });

  it.each([
    ['an ELF executable', bytes(0x7f, 0x45, 0x4c, 0x46)],
    ['a Windows executable', bytes(0x4d, 0x5a, 0x90, 0x00)],
    [
      'a RIFF file that is not WebP (WAV)',
      bytes(0x52, 0x49, 0x46, 0x46, 1, 2, 3, 4, 0x57, 0x41, 0x56, 0x45),
    ],
    ['HTML', new TextEncoder().encode('<html><script>')],
    ['SVG', new TextEncoder().encode('<svg xmlns="http://www.w3.org/2000/svg">')],
    ['nothing', new Uint8Array()],
    ['a truncated PNG signature', new Uint8Array([0x89, 0x50, 0x4e])],
  ])('refuses %s', (_name, b) => {
    expect(sniffType(b)).toBeUndefined();
  });
});
