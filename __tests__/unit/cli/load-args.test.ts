// npm run load's command line: what each argument asks for and the one-line refusals. The load run
// itself starts PostgreSQL and a server and takes minutes, so it stays out of the test suite.
import { LOAD_DURATION_S, type LoadOptions, parseLoadArgs, UsageError } from '@/scripts/lib/load-args';

const DEFAULTS: LoadOptions = { durationS: LOAD_DURATION_S.standard, json: false, quick: false, help: false };

describe('parseLoadArgs', () => {
  it.each<[string, string[], Partial<LoadOptions>]>([
    ['nothing: 30 s per endpoint, the table', [], {}],
    ['--json', ['--json'], { json: true }],
    ['--quick: 3 s per endpoint', ['--quick'], { quick: true, durationS: 3 }],
    ['--duration N', ['--duration', '45'], { durationS: 45 }],
    ['--duration=N', ['--duration=5'], { durationS: 5 }],
    ['the smallest duration', ['--duration', '1'], { durationS: 1 }],
    ['the largest duration, one hour', ['--duration', '3600'], { durationS: 3600 }],
    ['--json with --quick, either order', ['--quick', '--json'], { json: true, quick: true, durationS: 3 }],
    ['--json with --duration', ['--json', '--duration', '10'], { json: true, durationS: 10 }],
    ['--help', ['--help'], { help: true }],
    ['-h', ['-h'], { help: true }],
  ])('%s', (_name, argv, expected) => {
    expect(parseLoadArgs(argv)).toEqual({ ...DEFAULTS, ...expected });
  });

  it.each<[string, string[], RegExp]>([
    ['an unknown option', ['--rate', '100'], /^Unknown option '--rate'.* \(see --help\)$/],
    ['a positional argument', ['fast'], /^unexpected argument "fast" \(see --help\)$/],
    ['--duration without a value', ['--duration'], /--duration.*argument missing/],
    ['--duration of zero', ['--duration', '0'], /^--duration must be a whole number of seconds from 1 to 3600, got "0" \(see --help\)$/],
    ['--duration over an hour', ['--duration', '3601'], /from 1 to 3600, got "3601"/],
    ['a fractional --duration', ['--duration', '2.5'], /got "2.5"/],
    ['a --duration with a unit', ['--duration', '30s'], /got "30s"/],
    ['a negative --duration', ['--duration=-5'], /got "-5"/],
    ['--quick with --duration', ['--quick', '--duration', '10'], /^give --quick or --duration, not both \(see --help\)$/],
  ])('refuses %s with one line', (_name, argv, message) => {
    let thrown: unknown;
    try {
      parseLoadArgs(argv);
    } catch (err) {
      thrown = err;
    }
    expect(thrown).toBeInstanceOf(UsageError);
    const text = (thrown as Error).message;
    expect(text).toMatch(message);
    expect(text).not.toContain('\n');
  });
});
