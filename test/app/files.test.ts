/** A file that is not a section at all is named so in plain words before the loader reads it. */
import { describe, expect, it } from 'vitest';
import { notJsonText } from '../../src/app/files.ts';

describe('not a section file', () => {
  it('a picture (bytes that are not text) is called what it is', () => {
    // The first bytes of a PNG as File.text() decodes them: 0x89 is not UTF-8, so it becomes U+FFFD.
    expect(notJsonText('\uFFFDPNG\r\n\u001a\n\u0000\u0000\u0000\rIHDR')).toMatch(/not a text file \(it looks like a picture/);
  });

  it('text that is not JSON says a section file starts with "{"', () => {
    expect(notJsonText('Street intake port, 46 mm valve')).toMatch(/not a Portwright section file: .* starts with "\{"/);
    expect(notJsonText('')).toMatch(/starts with "\{"/);
  });

  it('JSON text is left to the loader', () => {
    expect(notJsonText('  {"format": "portwright-section"}')).toBeNull();
  });
});
