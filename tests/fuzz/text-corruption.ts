/**
 * Corruptions of a text file as it reaches a command: how it is encoded (UTF-8 with or without a
 * byte-order mark, UTF-16 little- or big-endian with or without one, as spreadsheet programs save
 * "Unicode text"), Windows or old-Mac line ends, and damage to the text itself (cut short, a stray
 * character, bare NaN / Infinity, a line repeated, a very long line, a zero byte).
 */
import fc from 'fast-check';

export type Encoding = 'utf8' | 'utf8-bom' | 'utf16le-bom' | 'utf16be-bom' | 'utf16le';

export type Damage =
  | { kind: 'none' }
  | { kind: 'truncate'; at: number }
  | { kind: 'insert'; at: number; text: string }
  | { kind: 'repeat-line'; pick: number }
  | { kind: 'crlf' }
  | { kind: 'cr' };

export interface TextCorruption {
  readonly encoding: Encoding;
  readonly damage: Damage;
}

const strayArb = fc.oneof(
  fc.constantFrom('NaN', 'Infinity', '-Infinity', ',', ';', '"', '\t', '\n', '\r', '}', ']', '{', '[', '\u0000', '\uFEFF', '\uFFFD', ',,,,', '1e999', 'x'.repeat(5000)),
  fc.string({ maxLength: 8 }),
);

const damageArb: fc.Arbitrary<Damage> = fc.oneof(
  { weight: 6, arbitrary: fc.constant<Damage>({ kind: 'none' }) },
  { weight: 1, arbitrary: fc.nat().map((at): Damage => ({ kind: 'truncate', at })) },
  { weight: 2, arbitrary: fc.record({ at: fc.nat(), text: strayArb }).map((r): Damage => ({ kind: 'insert', ...r })) },
  { weight: 1, arbitrary: fc.nat().map((pick): Damage => ({ kind: 'repeat-line', pick })) },
  { weight: 1, arbitrary: fc.constant<Damage>({ kind: 'crlf' }) },
  { weight: 1, arbitrary: fc.constant<Damage>({ kind: 'cr' }) },
);

export const textCorruptionArb: fc.Arbitrary<TextCorruption> = fc.record({
  encoding: fc.oneof({ weight: 8, arbitrary: fc.constant<Encoding>('utf8') }, { weight: 1, arbitrary: fc.constantFrom<Encoding>('utf8-bom', 'utf16le-bom', 'utf16be-bom', 'utf16le') }),
  damage: damageArb,
});

export function applyTextCorruption(text: string, c: TextCorruption): string {
  const d = c.damage;
  switch (d.kind) {
    case 'none':
      return text;
    case 'truncate':
      return text.slice(0, d.at % (text.length + 1));
    case 'insert': {
      const at = d.at % (text.length + 1);
      return text.slice(0, at) + d.text + text.slice(at);
    }
    case 'repeat-line': {
      const lines = text.split('\n');
      const k = d.pick % lines.length;
      lines.splice(k, 0, lines[k] ?? '');
      return lines.join('\n');
    }
    case 'crlf':
      return text.replace(/\n/g, '\r\n');
    case 'cr':
      return text.replace(/\n/g, '\r');
  }
}

export function encodeText(text: string, encoding: Encoding): Buffer {
  switch (encoding) {
    case 'utf8':
      return Buffer.from(text, 'utf8');
    case 'utf8-bom':
      return Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from(text, 'utf8')]);
    case 'utf16le':
      return Buffer.from(text, 'utf16le');
    case 'utf16le-bom':
      return Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(text, 'utf16le')]);
    case 'utf16be-bom': {
      const le = Buffer.from(text, 'utf16le');
      for (let i = 0; i + 1 < le.length; i += 2) [le[i], le[i + 1]] = [le[i + 1] as number, le[i] as number];
      return Buffer.concat([Buffer.from([0xfe, 0xff]), le]);
    }
  }
}
