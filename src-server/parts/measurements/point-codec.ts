/** Curves are stored as little-endian float64 arrays: exact, compact, and decoded without parsing. */
export function packFloat64(values: ArrayLike<number>): Buffer {
  const buffer = Buffer.allocUnsafe(values.length * 8);
  for (let i = 0; i < values.length; i++) buffer.writeDoubleLE(values[i], i * 8);
  return buffer;
}

export function unpackFloat64(buffer: Buffer | Uint8Array | null | undefined): Float64Array {
  if (!buffer || buffer.length === 0) return new Float64Array(0);
  if (buffer.length % 8 !== 0) throw new RangeError(`a packed float64 array needs a multiple of 8 bytes, got ${buffer.length}`);
  const out = new Float64Array(buffer.length / 8);
  const view = new DataView(buffer.buffer, buffer.byteOffset, buffer.byteLength);
  for (let i = 0; i < out.length; i++) out[i] = view.getFloat64(i * 8, true);
  return out;
}
