/** Reading settings: defaults, units and the messages for values out of range. */
import { describe, expect, it } from 'vitest';
import { ReadingSettingError } from '../../../src/solver/reading/errors.ts';
import { readingSettings } from '../../../src/solver/reading/options.ts';
import type { ReadingOptions } from '../../../src/solver/reading/types.ts';
import { lengthText, percentText } from '../../../src/solver/reading/wording.ts';

describe('reading settings', () => {
  it('fills in the stated defaults', () => {
    const s = readingSettings();
    expect(s).toMatchObject({
      stationCount: 40, valveIslandName: 'valve head', slowFraction: 0.35, overWideThreshold: 0.1, overWideWindow: 5,
      units: 'mm', metresPerUnit: 0.001, inletMeanSpeedMs: 60, kinematicViscosityM2s: 1.5e-5, start: 'turbulent',
      shapeFactorLimit: 2.4, streamlineCount: 24, deck: null,
    });
    // 1 in = 25.4 mm exactly [pub: NIST SP 811, appendix B]
    expect(readingSettings({ units: 'inch' }).metresPerUnit).toBe(0.0254);
    expect(readingSettings({ units: 'inch', metresPerUnit: 0.03 }).metresPerUnit).toBe(0.03);
  });

  it.each<[ReadingOptions, string, RegExp]>([
    [{ slowFraction: 1.5 }, 'slowFraction', /slow-zone share of the local mean speed is 1\.5; it must be a number from 0\.01 to 0\.99/],
    [{ stationCount: 2.5 }, 'stationCount', /number of stations is 2\.5; it must be a whole number/],
    [{ overWideWindow: 4 }, 'overWideWindow', /odd number of stations, not 4/],
    [{ units: 'cm' as 'mm' }, 'units', /'mm' or 'inch', not 'cm'/],
    [{ start: 'calm' as 'laminar' }, 'start', /'turbulent' or 'laminar', not 'calm'/],
    [{ inletMeanSpeedMs: Number.NaN }, 'inletMeanSpeedMs', /mean inlet speed \(m\/s\) is NaN/],
    [{ deck: { x: 0, y: Number.NaN, normalX: 0, normalY: -1 } }, 'deck', /deck line needs a point and a direction into the bore/],
    [{ deck: { x: 0, y: 0, normalX: 0, normalY: 0 } }, 'deck', /towards \(0, 0\)/],
  ])('rejects %o with a message naming the setting', (options, setting, message) => {
    try {
      readingSettings(options);
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(ReadingSettingError);
      expect((error as ReadingSettingError).setting).toBe(setting);
      expect((error as Error).message).toMatch(message);
    }
  });

  it('words lengths with their units and shares as percentages', () => {
    expect(lengthText(23.14, 'mm')).toBe('23.1 mm');
    expect(lengthText(123.4, 'mm')).toBe('123 mm');
    expect(lengthText(0.912, 'inch')).toBe('0.912 in');
    expect(lengthText(1.234, 'inch')).toBe('1.23 in');
    expect(percentText(0.18)).toBe('18%');
    expect(percentText(0.002)).toBe('under 1%');
    expect(percentText(0)).toBe('0%');
  });
});
