/** The field mesh: clipped to the outline's triangles, or the field's rectangle without an outline. */
import { describe, expect, it } from 'vitest';
import { FieldLayer } from '../../src/view/field-layer.ts';
import { polygonTriangles } from '../../src/view/polygon-mesh.ts';
import type { FieldImage } from '../../src/view/types.ts';

/** A 4 x 3 field at (x0, 0) with cell size 0.5, values 1..12. */
function field(x0: number): FieldImage {
  return { nx: 4, ny: 3, x0, y0: 0, h: 0.5, values: Float32Array.from({ length: 12 }, (_, k) => k + 1) };
}

const positionsOf = (layer: FieldLayer) => Array.from(layer.object.geometry.getAttribute('position').array);

describe('field layer mesh', () => {
  const outline = polygonTriangles({ xy: Float64Array.from([0, 0, 2, 0, 2, 1.5, 0, 1.5]), closed: true }, []);

  it('keeps the outline mesh when a new field of any grid follows (each drag step)', () => {
    const layer = new FieldLayer(0);
    layer.setClip(outline);
    layer.setField(field(0));
    const mesh = layer.object.geometry;
    expect(positionsOf(layer)).toEqual(Array.from(outline.positions));
    layer.setField(field(0.25));
    expect(layer.object.geometry).toBe(mesh);
    expect(positionsOf(layer)).toEqual(Array.from(outline.positions));
    expect(layer.object.visible).toBe(true);
    layer.dispose();
  });

  it('hides the mesh without a field and shows the outline again with one', () => {
    const layer = new FieldLayer(0);
    layer.setClip(outline);
    layer.setField(field(0));
    layer.setField(null);
    expect(layer.object.visible).toBe(false);
    layer.setField(field(0));
    expect(layer.object.visible).toBe(true);
    expect(positionsOf(layer)).toEqual(Array.from(outline.positions));
    layer.dispose();
  });

  it("without an outline follows each field's rectangle", () => {
    const layer = new FieldLayer(0);
    layer.setField(field(0));
    const xs = () => positionsOf(layer).filter((_, k) => k % 3 === 0);
    expect(Math.min(...xs())).toBe(0);
    expect(Math.max(...xs())).toBe(2);
    layer.setField(field(1));
    expect(Math.min(...xs())).toBe(1);
    expect(Math.max(...xs())).toBe(3);
    layer.dispose();
  });
});
