import { describe, expect, it } from 'vitest';
import { ViewNavigator } from '../../src/view/view-navigator.ts';
import { panBy } from '../../src/view/view-transform.ts';

describe('view navigator', () => {
  const bounds = { minX: 0, minY: 0, maxX: 40, maxY: 40 };

  it('refits new content until the user moves the view, then leaves it alone until asked', () => {
    let changes = 0;
    const nav = new ViewNavigator(() => changes++);
    const seen: number[] = [];
    nav.listen((t) => seen.push(t.scale));
    nav.resize(900, 640, bounds);
    const fitted = nav.state.scale;
    nav.contentChanged({ minX: 0, minY: 0, maxX: 80, maxY: 80 });
    expect(nav.state.scale).toBeCloseTo(fitted / 2, 9);
    nav.userMove(panBy(nav.state, 10, 0));
    const moved = nav.state;
    nav.contentChanged(bounds);
    nav.resize(900, 640, bounds);
    expect(nav.state.scale).toBe(moved.scale);
    expect(nav.state.centreX).toBe(moved.centreX);
    nav.fit(bounds);
    expect(nav.state.scale).toBeCloseTo(fitted, 9);
    expect(changes).toBe(seen.length);
    expect(changes).toBeGreaterThanOrEqual(5);
  });
});
