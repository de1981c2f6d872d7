/**
 * Where a JSON text stops being JSON (RFC 8259 grammar), for a message with line and column:
 * the JavaScript engine's own message does not always give a position. A small scanner without
 * recursion (a nested file thousands of levels deep is fine); it is called only after
 * JSON.parse has refused the text.
 */

export interface TextPosition {
  /** 0-based character offset. */
  readonly offset: number;
  /** 1-based line and column. */
  readonly line: number;
  readonly column: number;
}

export function positionAt(text: string, offset: number): TextPosition {
  let line = 1;
  let lineStart = 0;
  for (let i = 0; i < offset && i < text.length; i++) {
    if (text[i] === '\n') {
      line++;
      lineStart = i + 1;
    }
  }
  return { offset, line, column: offset - lineStart + 1 };
}

const WS = new Set([' ', '\t', '\n', '\r']);
const NUMBER = /-?(?:0|[1-9]\d*)(?:\.\d+)?(?:[eE][+-]?\d+)?/y;
const ESCAPE = /["\\/bfnrt]|u[0-9a-fA-F]{4}/y;

/** Offset of the first character where the text is not JSON; undefined when it is JSON. */
export function jsonErrorOffset(text: string): number | undefined {
  let i = 0;
  const skip = () => {
    while (i < text.length && WS.has(text[i] as string)) i++;
  };
  /** Containers open at i: '{' or '['; with what the scanner expects next inside each. */
  const stack: ('{' | '[')[] = [];
  type Want = 'value' | 'key' | 'colon' | 'comma-or-end' | 'value-or-end' | 'key-or-end';
  let want = 'value' as Want;
  const afterValue = () => {
    want = 'comma-or-end';
  };
  /** Scans a string from its opening quote; false with i at the wrong character when it is not one. */
  const scanString = (): boolean => {
    i++; // opening quote
    while (i < text.length) {
      const code = text.charCodeAt(i);
      if (code === 0x22) {
        i++;
        return true;
      }
      if (code < 0x20) return false; // control characters must be escaped (RFC 8259 §7)
      if (code === 0x5c) {
        ESCAPE.lastIndex = i + 1;
        if (ESCAPE.exec(text) === null) return false;
        i = ESCAPE.lastIndex;
      } else i++;
    }
    return false;
  };
  for (;;) {
    skip();
    if (i >= text.length) return stack.length === 0 && want === 'comma-or-end' ? undefined : i;
    const ch = text[i] as string;
    switch (want) {
      case 'value':
      case 'value-or-end': {
        if (want === 'value-or-end' && ch === ']') {
          stack.pop();
          i++;
          afterValue();
          break;
        }
        if (ch === '{') {
          stack.push('{');
          i++;
          want = 'key-or-end';
        } else if (ch === '[') {
          stack.push('[');
          i++;
          want = 'value-or-end';
        } else if (ch === '"') {
          if (!scanString()) return i;
          afterValue();
        } else if (text.startsWith('true', i) || text.startsWith('null', i)) {
          i += 4;
          afterValue();
        } else if (text.startsWith('false', i)) {
          i += 5;
          afterValue();
        } else {
          NUMBER.lastIndex = i;
          if (NUMBER.exec(text) === null) return i;
          i = NUMBER.lastIndex;
          afterValue();
        }
        break;
      }
      case 'key':
      case 'key-or-end': {
        if (want === 'key-or-end' && ch === '}') {
          stack.pop();
          i++;
          afterValue();
          break;
        }
        if (ch !== '"' || !scanString()) return i;
        want = 'colon';
        break;
      }
      case 'colon':
        if (ch !== ':') return i;
        i++;
        want = 'value';
        break;
      case 'comma-or-end': {
        const top = stack[stack.length - 1];
        if (top === undefined) return i; // text after the value
        if (ch === ',') {
          i++;
          want = top === '{' ? 'key' : 'value';
        } else if ((ch === '}' && top === '{') || (ch === ']' && top === '[')) {
          stack.pop();
          i++;
          afterValue();
        } else return i;
        break;
      }
    }
  }
}
