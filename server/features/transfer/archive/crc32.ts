/** The CRC-32 table of the zip format (ISO 3309 / ITU-T V.42 polynomial, reflected: 0xEDB88320). */
const TABLE = (() => {
  const table = new Int32Array(256);
  for (let n = 0; n < 256; n++) {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    table[n] = c;
  }
  return table;
})();

/**
 * CRC-32 as zip files record it, carried over chunks: `crc32(b, crc32(a))` equals `crc32(a + b)`.
 * Node 20's zlib has no crc32 of its own (it came in Node 22).
 */
export function crc32(bytes: Uint8Array, previous = 0): number {
  let c = ~previous;
  for (let i = 0; i < bytes.length; i++) c = TABLE[(c ^ bytes[i]!) & 0xff]! ^ (c >>> 8);
  return ~c >>> 0;
}
