/**
 * Bytes of a note to text: UTF-8 with or without a byte-order mark, UTF-16 with a BOM;
 * bytes that are not UTF-8 become U+FFFD rather than an exception.
 */
export function decodeNote(buf: Uint8Array): string {
  if (buf.length >= 2 && buf[0] === 0xff && buf[1] === 0xfe)
    return new TextDecoder('utf-16le').decode(buf.subarray(2));
  if (buf.length >= 2 && buf[0] === 0xfe && buf[1] === 0xff)
    return new TextDecoder('utf-16be').decode(buf.subarray(2));
  const text = new TextDecoder('utf-8', { fatal: false }).decode(buf);
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}
