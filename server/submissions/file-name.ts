/**
 * Browsers and curl send file names as raw UTF-8, which busboy reads byte by byte as Latin-1
 * (multer 2.0 cannot pass its charset option on). Read that way every byte is one character, so
 * the bytes are recovered exactly and read again as UTF-8; a name that is not valid UTF-8 then
 * (a Latin-1 client, or one already decoded from filename*) is kept as it came.
 */
export function utf8FileName(name: string): string {
  if (!/[\u0080-\u00ff]/.test(name) || /[\u0100-\uffff]/.test(name)) return name;
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(Buffer.from(name, 'latin1'));
  } catch {
    return name;
  }
}
