/**
 * Bytes of a history file to text, streamed: the file arrives in chunks cut anywhere (inside
 * a UTF-8 sequence, between the two bytes of a UTF-16 code unit, between the halves of a
 * surrogate pair), and the text comes out in order with nothing lost or doubled: each chunk
 * is cut after its last complete character and the rest carried to the next, so the text is
 * that of decoding the whole file at once. Pure: only the platform's `TextDecoder` (UTF-8
 * and UTF-16LE, which every platform has; big-endian bytes are swapped first).
 *
 * The encoding, as for notes (server/src/files/decode.ts), from the first bytes:
 * - a byte-order mark: EF BB BF (UTF-8), FF FE (UTF-16 LE), FE FF (UTF-16 BE); the mark is
 *   dropped;
 * - without a mark, UTF-16 is recognised by its zero bytes, which UTF-8 text never has: a
 *   history is digits, signs and delimiters, so in UTF-16 every other byte of it is zero.
 *   Among the first 512 bytes (or the whole file when shorter), zero bytes only at odd
 *   offsets, at least one pair in two, mean UTF-16 LE; only at even offsets, UTF-16 BE
 *   (common practice of text sniffing, no source);
 * - anything else is UTF-8; a byte that is not UTF-8 becomes U+FFFD (never an exception),
 *   and the reader then finds no number in that field.
 */
export type HistoryEncoding =
  | 'utf-8'
  | 'utf-8-bom'
  | 'utf-16le-bom'
  | 'utf-16be-bom'
  | 'utf-16le'
  | 'utf-16be';

/** How the encoding is named in the reader's information diagnostic. */
export function encodingName(e: HistoryEncoding): string {
  switch (e) {
    case 'utf-8':
      return 'UTF-8';
    case 'utf-8-bom':
      return 'UTF-8 with a byte-order mark';
    case 'utf-16le-bom':
      return 'UTF-16 LE with a byte-order mark';
    case 'utf-16be-bom':
      return 'UTF-16 BE with a byte-order mark';
    case 'utf-16le':
      return 'UTF-16 LE without a byte-order mark (recognised by its zero bytes)';
    case 'utf-16be':
      return 'UTF-16 BE without a byte-order mark (recognised by its zero bytes)';
  }
}

const SNIFF = 512;

/** The part of the platform's `TextDecoder` used here. */
interface Decoder {
  decode(input?: Uint8Array): string;
}

/** Decides the encoding from the first bytes of a file (all of them when it is shorter than 512). */
export function sniffHistoryEncoding(head: Uint8Array): { encoding: HistoryEncoding; bom: number } {
  const n = head.length;
  if (n >= 3 && head[0] === 0xef && head[1] === 0xbb && head[2] === 0xbf)
    return { encoding: 'utf-8-bom', bom: 3 };
  if (n >= 2 && head[0] === 0xff && head[1] === 0xfe) return { encoding: 'utf-16le-bom', bom: 2 };
  if (n >= 2 && head[0] === 0xfe && head[1] === 0xff) return { encoding: 'utf-16be-bom', bom: 2 };
  const pairs = Math.floor(Math.min(n, SNIFF) / 2);
  let even = 0;
  let odd = 0;
  for (let i = 0; i < pairs * 2; i++) {
    if (head[i] !== 0) continue;
    if (i % 2 === 0) even++;
    else odd++;
  }
  if (pairs > 0 && even === 0 && odd * 2 >= pairs) return { encoding: 'utf-16le', bom: 0 };
  if (pairs > 0 && odd === 0 && even * 2 >= pairs) return { encoding: 'utf-16be', bom: 0 };
  return { encoding: 'utf-8', bom: 0 };
}

/**
 * Where a UTF-8 chunk may be cut: before a last sequence that the chunk does not complete
 * (UTF-8 is self-synchronising, so decoding the two sides apart gives the text of the whole).
 */
function utf8Cut(src: Uint8Array): number {
  const n = src.length;
  for (let i = n - 1; i >= 0 && i >= n - 4; i--) {
    const b = src[i];
    if ((b & 0xc0) === 0x80) continue; // a continuation byte: look further back
    if (b < 0xc0) return n; // ASCII: complete
    const need = b >= 0xf0 ? 4 : b >= 0xe0 ? 3 : 2;
    return n - i < need ? i : n;
  }
  return n;
}

/** Where a UTF-16 chunk may be cut: after whole code units, and not after a high surrogate. */
function utf16Cut(src: Uint8Array, bigEndian: boolean): number {
  const even = src.length - (src.length % 2);
  if (even < 2) return even;
  const u = bigEndian ? (src[even - 2] << 8) | src[even - 1] : (src[even - 1] << 8) | src[even - 2];
  return u >= 0xd800 && u <= 0xdbff ? even - 2 : even;
}

function swapPairs(src: Uint8Array): Uint8Array {
  const out = new Uint8Array(src.length);
  const even = src.length - (src.length % 2);
  for (let k = 0; k < even; k += 2) {
    out[k] = src[k + 1];
    out[k + 1] = src[k];
  }
  if (even < src.length) out[even] = src[even];
  return out;
}

export class HistoryDecoder {
  /** The encoding, once the first bytes (or the end) have decided it. */
  encoding?: HistoryEncoding;
  /** Bytes taken in. */
  bytes = 0;
  private head: Uint8Array | null = new Uint8Array(SNIFF);
  private headLength = 0;
  private decoder?: Decoder;
  private utf16 = false;
  private bigEndian = false;
  /** The bytes of a character that the last chunk did not complete (at most 3). */
  private readonly carry = new Uint8Array(4);
  private carryLength = 0;

  /** Takes the next bytes; returns the text they complete ('' while the encoding is being decided). */
  write(chunk: Uint8Array): string {
    this.bytes += chunk.length;
    if (this.head !== null) {
      const take = Math.min(chunk.length, SNIFF - this.headLength);
      this.head.set(chunk.subarray(0, take), this.headLength);
      this.headLength += take;
      if (this.headLength < SNIFF) return '';
      const head = this.decide();
      return take < chunk.length ? head + this.decode(chunk.subarray(take)) : head;
    }
    return this.decode(chunk);
  }

  /** Ends the input: the text still held (a short file; an incomplete character as U+FFFD). */
  end(): string {
    const text = this.head !== null ? this.decide() : '';
    if (this.decoder === undefined || this.carryLength === 0) return text;
    const rest = this.carry.slice(0, this.carryLength);
    this.carryLength = 0;
    return text + this.decoder.decode(this.bigEndian ? swapPairs(rest) : rest);
  }

  private decide(): string {
    const head = (this.head as Uint8Array).subarray(0, this.headLength);
    this.head = null;
    const { encoding, bom } = sniffHistoryEncoding(head);
    this.encoding = encoding;
    this.utf16 = encoding !== 'utf-8' && encoding !== 'utf-8-bom';
    this.bigEndian = encoding === 'utf-16be' || encoding === 'utf-16be-bom';
    // ignoreBOM: the mark, if any, is cut off here, so a U+FEFF after it is text.
    this.decoder = new TextDecoder(this.utf16 ? 'utf-16le' : 'utf-8', { fatal: false, ignoreBOM: true });
    return this.decode(head.subarray(bom));
  }

  /**
   * Decodes the complete characters of `bytes` (after the carried ones) and carries the
   * rest. Each call decodes whole characters only, so no decoder state spans two calls.
   */
  private decode(bytes: Uint8Array): string {
    let src = bytes;
    if (this.carryLength > 0) {
      src = new Uint8Array(this.carryLength + bytes.length);
      src.set(this.carry.subarray(0, this.carryLength));
      src.set(bytes, this.carryLength);
      this.carryLength = 0;
    }
    const cut = this.utf16 ? utf16Cut(src, this.bigEndian) : utf8Cut(src);
    if (cut < src.length) {
      this.carry.set(src.subarray(cut));
      this.carryLength = src.length - cut;
    }
    if (cut === 0) return '';
    const body = src.subarray(0, cut);
    return (this.decoder as Decoder).decode(this.bigEndian ? swapPairs(body) : body);
  }
}
