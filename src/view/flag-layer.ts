/** Flag overlays drawn in WebGL: hatched zones (polygons or cells), their outlines and dashed flag lines. */

import {
  BufferAttribute,
  BufferGeometry,
  Color,
  DataTexture,
  Group,
  Mesh,
  NearestFilter,
  RedFormat,
  ShaderMaterial,
  UnsignedByteType,
  Vector2,
} from 'three';
import { LineLayer } from './line-layer.ts';
import { polygonTriangles, type Triangles } from './polygon-mesh.ts';
import { HATCH_FRAGMENT, SECTION_VERTEX } from './shaders.ts';
import type { CellMask, FlagShapes } from './types.ts';
import { FLAG_LINE_STYLE, FLAG_OUTLINE_STYLE, HATCH } from './view-style.ts';

function hatchMaterial(cellMask: boolean): ShaderMaterial {
  return new ShaderMaterial({
    vertexShader: SECTION_VERTEX,
    fragmentShader: HATCH_FRAGMENT,
    defines: cellMask ? { USE_CELL_MASK: '' } : {},
    uniforms: {
      uColour: { value: new Color(HATCH.colour) },
      uOpacity: { value: HATCH.opacity },
      uSpacing: { value: HATCH.spacingPx },
      uHalfWidth: { value: HATCH.widthPx / 2 },
      uMask: { value: null },
      uGridOrigin: { value: new Vector2() },
      uCellSize: { value: 1 },
      uGridSize: { value: new Vector2(1, 1) },
    },
    transparent: true,
    depthTest: false,
    depthWrite: false,
  });
}

function meshGeometry(tri: Triangles): BufferGeometry {
  const g = new BufferGeometry();
  g.setAttribute('position', new BufferAttribute(tri.positions, 3));
  g.setIndex(new BufferAttribute(tri.indices, 1));
  return g;
}

/** Merge several polygons' triangles into one vertex and index list. */
function mergeTriangles(parts: readonly Triangles[]): Triangles {
  const positions = new Float32Array(parts.reduce((n, p) => n + p.positions.length, 0));
  const indices = new Uint32Array(parts.reduce((n, p) => n + p.indices.length, 0));
  let pOff = 0;
  let iOff = 0;
  for (const p of parts) {
    positions.set(p.positions, pOff);
    for (let k = 0; k < p.indices.length; k++) indices[iOff + k] = p.indices[k] + pOff / 3;
    pOff += p.positions.length;
    iOff += p.indices.length;
  }
  return { positions, indices };
}

export class FlagLayer {
  readonly group = new Group();
  private readonly polygons = new Mesh(new BufferGeometry(), hatchMaterial(false));
  private readonly cells = new Mesh(new BufferGeometry(), hatchMaterial(true));
  private readonly outlines: LineLayer;
  private readonly lines: LineLayer;
  private cellTexture: DataTexture | null = null;
  private cellMask: CellMask | null = null;
  private clip: Triangles | null = null;

  constructor(renderOrder: number) {
    for (const [k, m] of [this.polygons, this.cells].entries()) {
      m.renderOrder = renderOrder + k;
      m.frustumCulled = false;
      m.visible = false;
      this.group.add(m);
    }
    this.outlines = new LineLayer(FLAG_OUTLINE_STYLE, renderOrder + 2);
    this.lines = new LineLayer(FLAG_LINE_STYLE, renderOrder + 3);
    this.group.add(this.outlines.object, this.lines.object);
  }

  setFlags(flags: FlagShapes): void {
    // Empty flags over empty flags (every drag step) rebuild nothing.
    if (flags.hatched.length > 0 || this.polygons.visible) {
      this.polygons.geometry.dispose();
      const tris = flags.hatched.map((p) => polygonTriangles(p, []));
      this.polygons.geometry = meshGeometry(mergeTriangles(tris));
      this.polygons.visible = tris.some((t) => t.indices.length > 0);
    }
    this.outlines.setLines(flags.hatched.map((p) => ({ xy: p.xy, closed: true })));
    this.lines.setLines(flags.lines.map((l) => ({ xy: l.xy, closed: false })));
    this.setCells(flags.hatchedCells ?? null);
  }

  /** Triangles of the fluid outline (or null): hatched cells are cut to it, so they do not hatch past a wall. */
  setClip(clip: Triangles | null): void {
    this.clip = clip;
    if (this.cellMask) this.rebuildCellGeometry();
  }

  private setCells(mask: CellMask | null): void {
    if (mask === null && this.cellMask === null) return;
    this.cellTexture?.dispose();
    this.cellTexture = null;
    this.cellMask = mask;
    if (mask) {
      const { nx, ny, x0, y0, h } = mask;
      if (mask.mask.length !== nx * ny) throw new RangeError(`Flag mask has ${mask.mask.length} cells for ${nx} x ${ny}.`);
      const bytes = Uint8Array.from(mask.mask, (v) => (v ? 255 : 0));
      const tex = new DataTexture(bytes, nx, ny, RedFormat, UnsignedByteType);
      tex.magFilter = tex.minFilter = NearestFilter;
      tex.generateMipmaps = false;
      tex.unpackAlignment = 1;
      tex.needsUpdate = true;
      this.cellTexture = tex;
      const u = this.cells.material.uniforms;
      u.uMask.value = tex;
      u.uGridOrigin.value.set(x0, y0);
      u.uCellSize.value = h;
      u.uGridSize.value.set(nx, ny);
    }
    this.rebuildCellGeometry();
  }

  private rebuildCellGeometry(): void {
    this.cells.geometry.dispose();
    const m = this.cellMask;
    this.cells.visible = m !== null;
    if (!m) {
      this.cells.geometry = new BufferGeometry();
      return;
    }
    const x1 = m.x0 + m.nx * m.h;
    const y1 = m.y0 + m.ny * m.h;
    const rect = { xy: Float64Array.from([m.x0, m.y0, x1, m.y0, x1, y1, m.x0, y1]), closed: true };
    this.cells.geometry = meshGeometry(this.clip ?? polygonTriangles(rect, []));
  }

  /** Hatch spacing is in device px in the shader; keep it constant in CSS px on high-DPI screens. */
  setPixelRatio(ratio: number): void {
    for (const m of [this.polygons, this.cells]) {
      m.material.uniforms.uSpacing.value = HATCH.spacingPx * ratio;
      m.material.uniforms.uHalfWidth.value = (HATCH.widthPx * ratio) / 2;
    }
  }

  setScale(pxPerUnit: number): void {
    this.lines.setScale(pxPerUnit);
  }

  dispose(): void {
    for (const m of [this.polygons, this.cells]) {
      m.geometry.dispose();
      m.material.dispose();
    }
    this.cellTexture?.dispose();
    this.outlines.dispose();
    this.lines.dispose();
  }
}
