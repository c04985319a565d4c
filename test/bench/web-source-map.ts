/**
 * Reads a source map's `mappings` (Source Map Revision 3: lines split by `;`, segments by `,`, each
 * segment Base64 VLQ fields relative to the previous one) into spans of generated text, each with
 * the index of the source it came from.
 */
const BASE64 = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789+/';
const DIGIT = new Map([...BASE64].map((char, value) => [char, value]));

/** A segment's fields: 5 bits a digit, low digits first, bit 6 "more follows", lowest bit the sign. */
export function decodeVlqFields(segment: string): number[] {
  const fields: number[] = [];
  let value = 0;
  let shift = 0;
  for (const char of segment) {
    const digit = DIGIT.get(char);
    if (digit === undefined) throw new Error(`"${char}" is not a Base64 VLQ digit`);
    value += (digit & 31) * 2 ** shift;
    shift += 5;
    if (digit & 32) continue;
    fields.push(value % 2 ? -(value - 1) / 2 : value / 2);
    value = 0;
    shift = 0;
  }
  return fields;
}

export interface MappedSpan {
  line: number;
  start: number;
  end: number;
  /** Index into the map's `sources`; undefined for generated text no source claims. */
  source: number | undefined;
}

/** The spans of each generated line, up to the next segment or the line's end (`lineLengths`). */
export function decodeSourceMapSegments(mappings: string, lineLengths: readonly number[]): MappedSpan[] {
  const spans: MappedSpan[] = [];
  let source = 0;
  mappings.split(';').forEach((lineText, line) => {
    if (lineText === '') return;
    let column = 0;
    const starts: { column: number; source: number | undefined }[] = [];
    for (const segment of lineText.split(',')) {
      const fields = decodeVlqFields(segment);
      column += fields[0];
      if (fields.length > 1) source += fields[1];
      starts.push({ column, source: fields.length > 1 ? source : undefined });
    }
    starts.forEach((s, i) => {
      const end = i + 1 < starts.length ? starts[i + 1].column : (lineLengths[line] ?? s.column);
      if (end > s.column) spans.push({ line, start: s.column, end, source: s.source });
    });
  });
  return spans;
}
