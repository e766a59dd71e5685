import type { TextEncodingName } from './types';

export interface DecodedText {
  text: string;
  encoding: TextEncodingName;
  bom: boolean;
}

function decodeWith(label: string, bytes: Uint8Array, fatal: boolean): string {
  return new TextDecoder(label, { fatal }).decode(bytes);
}

// Some runtimes ship TextDecoder without the legacy/UTF-16BE tables; a manual path keeps those files readable.
function manualUtf16(bytes: Uint8Array, littleEndian: boolean): string {
  const parts: string[] = [];
  const chunk = 8192;
  for (let start = 0; start + 1 < bytes.length; start += chunk * 2) {
    const end = Math.min(bytes.length - 1, start + chunk * 2);
    const units: number[] = [];
    for (let i = start; i < end; i += 2) units.push(littleEndian ? bytes[i] | (bytes[i + 1] << 8) : (bytes[i] << 8) | bytes[i + 1]);
    parts.push(String.fromCharCode(...units));
  }
  return parts.join('');
}

function manualLatin1(bytes: Uint8Array): string {
  const parts: string[] = [];
  for (let i = 0; i < bytes.length; i += 8192) parts.push(String.fromCharCode(...bytes.subarray(i, i + 8192)));
  return parts.join('');
}

function decodeUtf16(bytes: Uint8Array, littleEndian: boolean): string {
  try {
    return decodeWith(littleEndian ? 'utf-16le' : 'utf-16be', bytes, false);
  } catch {
    return manualUtf16(bytes, littleEndian);
  }
}

/** UTF-16 written without a BOM shows as ASCII bytes alternating with NULs; which half holds the NULs gives the byte order. */
function sniffUtf16(bytes: Uint8Array): 'le' | 'be' | null {
  const n = Math.min(bytes.length, 4096) & ~1;
  if (n < 4) return null;
  let evenZeros = 0;
  let oddZeros = 0;
  for (let i = 0; i < n; i += 2) {
    if (bytes[i] === 0) evenZeros++;
    if (bytes[i + 1] === 0) oddZeros++;
  }
  const pairs = n / 2;
  if (oddZeros > pairs * 0.6 && evenZeros < pairs * 0.1) return 'le';
  if (evenZeros > pairs * 0.6 && oddZeros < pairs * 0.1) return 'be';
  return null;
}

export function decodeText(bytes: Uint8Array): DecodedText {
  if (bytes.length >= 3 && bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf) {
    return { text: decodeWith('utf-8', bytes.subarray(3), false), encoding: 'utf-8', bom: true };
  }
  if (bytes.length >= 2 && bytes[0] === 0xff && bytes[1] === 0xfe) {
    return { text: decodeUtf16(bytes.subarray(2), true), encoding: 'utf-16le', bom: true };
  }
  if (bytes.length >= 2 && bytes[0] === 0xfe && bytes[1] === 0xff) {
    return { text: decodeUtf16(bytes.subarray(2), false), encoding: 'utf-16be', bom: true };
  }
  const sniffed = sniffUtf16(bytes);
  if (sniffed) return { text: decodeUtf16(bytes, sniffed === 'le'), encoding: sniffed === 'le' ? 'utf-16le' : 'utf-16be', bom: false };
  try {
    return { text: decodeWith('utf-8', bytes, true), encoding: 'utf-8', bom: false };
  } catch {
    // Older spreadsheet exports on western-locale machines write single-byte text (µ, °, Ω in the header).
    let text: string;
    try {
      text = decodeWith('windows-1252', bytes, false);
    } catch {
      text = manualLatin1(bytes);
    }
    return { text, encoding: 'windows-1252', bom: false };
  }
}
