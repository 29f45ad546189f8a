/**
 * The parsed log as one compact binary object, so an analysis reads 16–24 bytes a reading
 * instead of re-parsing the CSV. Frostfold's own layout (little-endian throughout):
 *
 *   bytes 0–7    ASCII "FFSER001" (format and version)
 *   bytes 8–11   uint32 reading count n
 *   bytes 12–15  uint32 column count c: 2 (time, value) or 3 (time, value, pressure)
 *   then c blocks of n float64: time in s from the first reading, value in the series unit,
 *   barometric pressure in Pa
 *
 * Column blocks (not interleaved rows) let a reader take each column as a Float64Array view.
 */
const MAGIC = "FFSER001";
const HEADER_BYTES = 16;

export interface StoredSeries {
  time: Float64Array;
  value: Float64Array;
  pressure: Float64Array | null;
}

export function encodeSeries(series: StoredSeries): Buffer {
  const n = series.time.length;
  const columns = series.pressure ? 3 : 2;
  const buffer = Buffer.alloc(HEADER_BYTES + columns * n * 8);
  buffer.write(MAGIC, 0, "ascii");
  buffer.writeUInt32LE(n, 8);
  buffer.writeUInt32LE(columns, 12);
  const body = new Float64Array(buffer.buffer, buffer.byteOffset + HEADER_BYTES, columns * n);
  body.set(series.time.subarray(0, n), 0);
  body.set(series.value.subarray(0, n), n);
  if (series.pressure) body.set(series.pressure.subarray(0, n), 2 * n);
  return buffer;
}

export function decodeSeries(buffer: Buffer): StoredSeries {
  if (buffer.length < HEADER_BYTES || buffer.toString("ascii", 0, 8) !== MAGIC) throw new Error("not a Frostfold series object");
  const n = buffer.readUInt32LE(8);
  const columns = buffer.readUInt32LE(12);
  if ((columns !== 2 && columns !== 3) || buffer.length !== HEADER_BYTES + columns * n * 8) throw new Error("truncated Frostfold series object");
  // Copy once into an aligned buffer: a Buffer from the network may start at any byte offset.
  const body = new Float64Array(columns * n);
  new Uint8Array(body.buffer).set(buffer.subarray(HEADER_BYTES));
  return {
    time: body.subarray(0, n),
    value: body.subarray(n, 2 * n),
    pressure: columns === 3 ? body.subarray(2 * n, 3 * n) : null,
  };
}
