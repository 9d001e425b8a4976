import { describe, expect, it } from 'vitest';
import { UserError } from '../../src/cli/errors.ts';
import { parseSolveArgs } from '../../src/cli/solve-args.ts';

/** The UserError message parseSolveArgs throws for `args`. */
function refusal(args: string[]): string {
  try {
    parseSolveArgs(args);
  } catch (error) {
    expect(error).toBeInstanceOf(UserError);
    return (error as Error).message;
  }
  throw new Error(`expected ${args.join(' ')} to be refused`);
}

describe('solve arguments', () => {
  it("defaults: the active variant, the file's own grid detail (cells undefined), no probes, readable output", () => {
    expect(parseSolveArgs(['port.json'])).toEqual({
      file: 'port.json', variant: undefined, cells: undefined, probes: [], json: false, tolerance: undefined,
    });
  });

  it('reads every flag, in any order, as "--flag value" or "--flag=value"', () => {
    const args = ['--json', '--probe', '80,40', 'port.json', '--variant=generous short side', '--cells', '1_000_000', '--probe=-2.5,1e1', '--tolerance', '1e-10'];
    expect(parseSolveArgs(args)).toEqual({
      file: 'port.json', variant: 'generous short side', cells: 1_000_000, probes: [[80, 40], [-2.5, 10]], json: true, tolerance: 1e-10,
    });
  });

  it('takes a value that starts with a minus sign as the value', () => {
    expect(parseSolveArgs(['p.json', '--probe', '-5,-30']).probes).toEqual([[-5, -30]]);
  });

  it.each([['1000', 1000], ['16000000', 16_000_000], ['2.5e5', 250_000]])('accepts --cells %s', (text, cells) => {
    expect(parseSolveArgs(['p.json', '--cells', text]).cells).toBe(cells);
  });

  it.each(['10', '999', '16000001', '2500.5', 'many', '-5000'])('refuses --cells %s with the allowed range', (text) => {
    expect(refusal(['p.json', '--cells', text])).toBe(
      `--cells must be a whole number from 1,000 to 16,000,000 (got "${text}"); the standard grid is 250,000`,
    );
  });

  it.each(['80', '80,', ',40', '80,40,5', 'a,b', '80;40'])('refuses --probe %s and shows the form', (text) => {
    expect(refusal(['p.json', '--probe', text])).toContain('--probe takes a point as X,Y in the file\'s units');
  });

  it.each(['0', '1e-20', '0.5', 'tight'])('refuses --tolerance %s', (text) => {
    expect(refusal(['p.json', '--tolerance', text])).toContain('--tolerance must be a number from 1e-13 to 0.01');
  });

  it('refuses a missing value, an unknown option, a flag given twice, and no file or two', () => {
    expect(refusal(['p.json', '--cells'])).toMatch(/^--cells needs a value; usage: portwright solve FILE/);
    expect(refusal(['p.json', '--variant='])).toMatch(/^--variant needs a value/);
    expect(refusal(['p.json', '--lift', '10'])).toMatch(/^unknown option --lift; usage:/);
    expect(refusal(['p.json', '--cells', '5000', '--cells=6000'])).toBe('--cells is given twice; give it once');
    expect(refusal(['--json'])).toMatch(/^solve takes one file \(got 0\)/);
    expect(refusal(['a.json', 'b.json'])).toMatch(/^solve takes one file \(got 2\)/);
  });
});
