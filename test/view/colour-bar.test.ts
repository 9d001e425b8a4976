/** The colour bar names only a corner spike under the bar, never a second peak beside the readings' one. */
import { describe, expect, it } from 'vitest';
import { spikeLines } from '../../src/view/colour-bar.ts';

describe('spikeLines', () => {
  const range = { min: 0, max: 3.2 };

  it('names the highest cell a corner spike when it lies above the scale and above the peak clear of corners', () => {
    expect(spikeLines(range, 7.66, 3.54)).toEqual(['\u25B2 corner spike', '7.66']);
  });

  it('says nothing when the highest cell is the peak itself (no sharp corner), however far above the scale', () => {
    expect(spikeLines(range, 3.54, 3.54)).toEqual([]);
    expect(spikeLines(range, 3.6, 3.54)).toEqual([]); // within the 2% scatter of a smooth peak
  });

  it('says nothing when the spike is inside the scale (a fixed range above it) or there is no field or no peak', () => {
    expect(spikeLines({ min: 0, max: 10 }, 7.66, 3.54)).toEqual([]);
    expect(spikeLines(range, NaN, 3.54)).toEqual([]);
    expect(spikeLines(range, 7.66, NaN)).toEqual([]);
  });
});
