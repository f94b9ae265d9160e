// The command lines' JSON reader: a syntax fault told as line, column and reason.
import fc from 'fast-check';

import { findJsonFault, InputError, lineColumn, parseJsonText } from '@/scripts/lib/json-text';

function faultAt(text: string): string {
  const fault = findJsonFault(text);
  if (fault === null) return 'none';
  const { line, column } = lineColumn(text, fault.offset);
  return `${line}:${column} ${fault.reason}`;
}

describe('findJsonFault', () => {
  it.each([
    ['valid nested document', '{"a": [1, -2.5e3, true, null, {"b": "\\u00e9\\n"}]}', 'none'],
    ['trailing comma in an array', '[1, 2,]', "1:7 trailing comma before ']'"],
    ['trailing comma in an object, second line', '{"a": 1,\n }', "2:2 trailing comma before '}'"],
    ['missing value', '{"a": }', "1:7 expected a value, found '}'"],
    ['missing comma', '{"a": 1 "b": 2}', "1:9 expected ',' or '}' after a property value, found '\"'"],
    ['single quotes', "{'a': 1}", "1:2 strings and names need double quotes, not '"],
    ['unquoted name', '{a: 1}', "1:2 expected a property name in double quotes, found 'a'"],
    ['Infinity', '{"a": -Infinity}', '1:7 JSON has no Infinity; give a finite number'],
    ['NaN', '[NaN]', '1:2 JSON has no Infinity or NaN; give a finite number'],
    ['leading zero', '[01]', '1:3 a number cannot have a leading zero'],
    ['bare decimal point', '[1.]', "1:4 expected a digit after the decimal point, found ']'"],
    ['unterminated string', '["abc', '1:2 unterminated string (missing closing ")'],
    ['raw line break in a string', '["a\nb"]', '1:4 a control character (U+000A) inside a string (a line break must be written \\n)'],
    ['bad escape', '["\\x"]', '1:3 invalid escape \\x in a string'],
    ['unclosed array', '[1, 2', "1:6 unexpected end of input: a ']' is missing"],
    ['text after the value', '{} x', "1:4 unexpected 'x' after the end of the JSON value"],
    ['empty', '', '1:1 unexpected end of input: a value is missing'],
    ['CRLF lines', '{\r\n"a": 1,\r\n"b": }', "3:6 expected a value, found '}'"],
  ])('%s', (_name, text, expected) => {
    expect(faultAt(text)).toBe(expected);
  });

  it('agrees with JSON.parse on what is valid', () => {
    const parses = (s: string) => {
      try {
        JSON.parse(s);
        return true;
      } catch {
        return false;
      }
    };
    fc.assert(fc.property(fc.json(), (s) => findJsonFault(s) === null));
    fc.assert(fc.property(fc.jsonValue(), (v) => findJsonFault(JSON.stringify(v, null, 2) ?? 'null') === null));
    // Valid documents cut short or with one character changed: both readers must agree.
    const mangled = fc.tuple(fc.json(), fc.nat(), fc.constantFrom('', ',', '}', ']', '"', ':', ' ', 'x', '0', '\n'));
    fc.assert(
      fc.property(mangled, ([s, at, ch]) => {
        const i = s.length === 0 ? 0 : at % s.length;
        const text = s.slice(0, i) + ch + s.slice(i + 1);
        return (findJsonFault(text) === null) === parses(text);
      }),
      { numRuns: 2000 },
    );
  });
});

describe('parseJsonText', () => {
  it('drops a byte-order mark', () => {
    expect(parseJsonText('\uFEFF{"a": 1}')).toEqual({ a: 1 });
  });

  it('throws one line with line and column', () => {
    expect(() => parseJsonText('{\n"a": }')).toThrow(new InputError("invalid JSON at line 2 column 6: expected a value, found '}'"));
  });
});
