// JSON text to a value, with a syntax error told as line and column in words a person can act on.
// V8's own messages differ between Node versions and often give no position ("Unexpected token
// '}', ... is not valid JSON"), so on failure a small scanner finds the first fault itself.

/** Bad input for a command-line script; the message is one line, ready for stderr. */
export class InputError extends Error {
  constructor(message: string) {
    super(message.replace(/\s*\n\s*/g, ' '));
    this.name = 'InputError';
  }
}

/** Where JSON text first goes wrong (UTF-16 offset) and why, in words. */
export interface Fault {
  offset: number;
  reason: string;
}

const WS = new Set([' ', '\t', '\n', '\r']);
const ESCAPES = new Set(['"', '\\', '/', 'b', 'f', 'n', 'r', 't']);

function shown(ch: string | undefined): string {
  if (ch === undefined) return 'the end of the input';
  const code = ch.charCodeAt(0);
  return code < 0x20 ? `a control character (U+${code.toString(16).padStart(4, '0').toUpperCase()})` : `'${ch}'`;
}

/** Walks JSON text once, keeping open brackets on a stack (no recursion, so any depth is fine). */
class Scanner {
  private i = 0;
  private readonly stack: string[] = [];

  constructor(private readonly text: string) {}

  /** The first fault, or null when the whole text is one valid JSON value. */
  run(): Fault | null {
    for (;;) {
      const opened = this.stack.length;
      const bad = this.value();
      if (bad) return bad;
      if (this.stack.length > opened) {
        const first = this.firstMember();
        if (first === 'member') continue;
        if (first) return first;
      }
      const next = this.afterValue();
      if (next !== 'member') return next;
    }
  }

  private fault(reason: string, at = this.i): Fault {
    return { offset: at, reason };
  }

  private skipWs(): void {
    while (this.i < this.text.length && WS.has(this.text[this.i] as string)) this.i++;
  }

  private digits(): boolean {
    const start = this.i;
    while (/[0-9]/.test(this.text[this.i] ?? '')) this.i++;
    return this.i > start;
  }

  /** Scans one scalar, or opens a container. */
  private value(): Fault | null {
    this.skipWs();
    const { text, i } = this;
    const ch = text[i];
    if (ch === '{' || ch === '[') {
      this.stack.push(ch);
      this.i++;
      return null;
    }
    if (ch === '"') return this.string();
    if (text.startsWith('-Infinity', i)) return this.fault('JSON has no Infinity; give a finite number');
    if (ch === '-' || /[0-9]/.test(ch ?? '')) return this.number();
    for (const word of ['true', 'false', 'null']) {
      if (text.startsWith(word, i)) {
        this.i += word.length;
        return null;
      }
    }
    if (text.startsWith('Infinity', i) || text.startsWith('NaN', i)) return this.fault('JSON has no Infinity or NaN; give a finite number');
    if (ch === "'") return this.fault("strings and names need double quotes, not '");
    if (ch === undefined) return this.fault('unexpected end of input: a value is missing');
    return this.fault(`expected a value, found ${shown(ch)}`);
  }

  private string(): Fault | null {
    const { text } = this;
    const start = this.i++;
    while (this.i < text.length) {
      const ch = text[this.i] as string;
      if (ch === '"') {
        this.i++;
        return null;
      }
      if (ch.charCodeAt(0) < 0x20) return this.fault(`${shown(ch)} inside a string (a line break must be written \\n)`);
      if (ch === '\\') {
        const e = text[this.i + 1];
        if (e === 'u' && !/^[0-9a-fA-F]{4}$/.test(text.slice(this.i + 2, this.i + 6))) return this.fault('\\u must be followed by four hex digits');
        if (e !== 'u' && (e === undefined || !ESCAPES.has(e))) return this.fault(`invalid escape \\${e ?? ''} in a string`);
        this.i += e === 'u' ? 6 : 2;
        continue;
      }
      this.i++;
    }
    return this.fault('unterminated string (missing closing ")', start);
  }

  private number(): Fault | null {
    const { text } = this;
    if (text[this.i] === '-') this.i++;
    if (text[this.i] === '0') {
      this.i++;
      if (/[0-9]/.test(text[this.i] ?? '')) return this.fault('a number cannot have a leading zero');
    } else if (!this.digits()) {
      return this.fault(`expected a digit, found ${shown(text[this.i])}`);
    }
    if (text[this.i] === '.') {
      this.i++;
      if (!this.digits()) return this.fault(`expected a digit after the decimal point, found ${shown(text[this.i])}`);
    }
    if (text[this.i] === 'e' || text[this.i] === 'E') {
      this.i++;
      if (text[this.i] === '+' || text[this.i] === '-') this.i++;
      if (!this.digits()) return this.fault(`expected a digit in the exponent, found ${shown(text[this.i])}`);
    }
    return null;
  }

  /** In an object: a name in double quotes and a colon, before the member's value. */
  private name(): Fault | null {
    this.skipWs();
    const ch = this.text[this.i];
    if (ch === undefined) return this.fault('unexpected end of input: a property name is missing');
    if (ch === "'") return this.fault("strings and names need double quotes, not '");
    if (ch !== '"') return this.fault(`expected a property name in double quotes, found ${shown(ch)}`);
    const bad = this.string();
    if (bad) return bad;
    this.skipWs();
    if (this.text[this.i] !== ':') return this.fault(`expected ':' after the property name, found ${shown(this.text[this.i])}`);
    this.i++;
    return null;
  }

  /** Just after '{' or '[': closes an empty container, or readies the first member ('member'). */
  private firstMember(): Fault | 'member' | null {
    this.skipWs();
    const close = this.stack[this.stack.length - 1] === '{' ? '}' : ']';
    if (this.text[this.i] === close) {
      this.stack.pop();
      this.i++;
      return null;
    }
    return close === '}' ? (this.name() ?? 'member') : 'member';
  }

  /** After a value: closing brackets, then a comma ('member' follows), or the end (null). */
  private afterValue(): Fault | 'member' | null {
    for (;;) {
      this.skipWs();
      const ch = this.text[this.i];
      const top = this.stack[this.stack.length - 1];
      if (top === undefined) return ch === undefined ? null : this.fault(`unexpected ${shown(ch)} after the end of the JSON value`);
      const close = top === '{' ? '}' : ']';
      if (ch === close) {
        this.stack.pop();
        this.i++;
        continue;
      }
      if (ch === undefined) return this.fault(`unexpected end of input: a '${close}' is missing`);
      if (ch !== ',') return this.fault(`expected ',' or '${close}' after ${top === '{' ? 'a property value' : 'an array element'}, found ${shown(ch)}`);
      this.i++;
      this.skipWs();
      if (this.text[this.i] === close) return this.fault(`trailing comma before '${close}'`);
      return top === '{' ? (this.name() ?? 'member') : 'member';
    }
  }
}

/** Finds the first syntax fault in text, or null when the text is valid JSON. */
export function findJsonFault(text: string): Fault | null {
  return new Scanner(text).run();
}

/** 1-based line and column (in UTF-16 units) of an offset. */
export function lineColumn(text: string, offset: number): { line: number; column: number } {
  let line = 1;
  let lineStart = 0;
  for (let k = 0; k < offset && k < text.length; k++) {
    if (text.charCodeAt(k) === 10) {
      line++;
      lineStart = k + 1;
    }
  }
  return { line, column: offset - lineStart + 1 };
}

/** True when text holds nothing but whitespace (and perhaps a byte-order mark). */
export function isBlank(text: string): boolean {
  return text.replace(/^\uFEFF/, '').trim() === '';
}

/** Parses JSON text (a leading byte-order mark is dropped); throws InputError with line and column. */
export function parseJsonText(text: string): unknown {
  const body = text.replace(/^\uFEFF/, '');
  try {
    return JSON.parse(body);
  } catch (err) {
    const found = findJsonFault(body);
    if (found === null) throw new InputError(`invalid JSON: ${err instanceof Error ? err.message : String(err)}`);
    const { line, column } = lineColumn(body, found.offset);
    throw new InputError(`invalid JSON at line ${line} column ${column}: ${found.reason}`);
  }
}
