import { utf8FileName } from './file-name';

// What busboy hands over for a name sent as raw bytes: each byte read as one Latin-1 character.
const asLatin1 = (bytes: Uint8Array) => Buffer.from(bytes).toString('latin1');

describe('utf8FileName', () => {
  it('recovers names sent as UTF-8 in any script', () => {
    for (const name of ['измерение.txt', '周波数特性-0deg.csv', 'Schallpegel-Öffnung.txt', 'spl-30°.txt']) {
      expect(utf8FileName(asLatin1(new TextEncoder().encode(name)))).toBe(name);
    }
  });

  it('keeps plain ASCII, Latin-1 bytes that are not UTF-8, and names already decoded', () => {
    expect(utf8FileName('spl-0deg.txt')).toBe('spl-0deg.txt');
    // "café" from a client that sends Latin-1: the lone 0xE9 byte is not valid UTF-8.
    expect(utf8FileName(asLatin1(new Uint8Array([0x63, 0x61, 0x66, 0xe9])))).toBe('café');
    // Decoded by busboy from filename*=UTF-8''…, so it has characters beyond one byte.
    expect(utf8FileName('周波数.txt')).toBe('周波数.txt');
  });
});
