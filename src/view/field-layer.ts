/** The speed-ratio field as a textured mesh: values and fluid mask as textures, colour map and range as uniforms. */

import {
  BufferAttribute,
  BufferGeometry,
  DataTexture,
  FloatType,
  LinearFilter,
  Mesh,
  NearestFilter,
  RedFormat,
  RGBAFormat,
  ShaderMaterial,
  SRGBColorSpace,
  UnsignedByteType,
  Vector2,
} from 'three';
import { COLOUR_MAP_SIZE, colourMapBytes } from './colour-map.ts';
import type { Triangles } from './polygon-mesh.ts';
import { FIELD_FRAGMENT, SECTION_VERTEX } from './shaders.ts';
import type { FieldImage, ValueRange } from './types.ts';

/** Without an outline, draw where at least half the bilinear weight is fluid: the edge falls on the cell faces. */
const COVERAGE_CUT_MASK = 0.5;
/** With an outline, the triangles clip exactly; draw anywhere a fluid cell is near. */
const COVERAGE_CUT_OUTLINE = 1e-4;

function colourMapTexture(): DataTexture {
  const tex = new DataTexture(colourMapBytes(), COLOUR_MAP_SIZE, 1, RGBAFormat, UnsignedByteType);
  tex.colorSpace = SRGBColorSpace;
  tex.magFilter = LinearFilter;
  tex.minFilter = LinearFilter;
  tex.generateMipmaps = false;
  tex.needsUpdate = true;
  return tex;
}

/** Single-channel texture with NEAREST sampling, rows bottom-up (row j is section y increasing). */
function gridTexture(data: Float32Array | Uint8Array, nx: number, ny: number): DataTexture {
  const type = data instanceof Float32Array ? FloatType : UnsignedByteType;
  const tex = new DataTexture(data, nx, ny, RedFormat, type);
  tex.magFilter = NearestFilter;
  tex.minFilter = NearestFilter;
  tex.generateMipmaps = false;
  tex.unpackAlignment = 1;
  tex.needsUpdate = true;
  return tex;
}

export class FieldLayer {
  readonly object: Mesh<BufferGeometry, ShaderMaterial>;
  private readonly colourMap = colourMapTexture();
  private values: DataTexture | null = null;
  private mask: DataTexture | null = null;
  private field: FieldImage | null = null;
  /** Triangles of the fluid outline, kept so a new field (each drag step) does not triangulate again. */
  private clip: Triangles | null = null;

  constructor(renderOrder: number) {
    const material = new ShaderMaterial({
      vertexShader: SECTION_VERTEX,
      fragmentShader: FIELD_FRAGMENT,
      uniforms: {
        uValues: { value: null },
        uMask: { value: null },
        uColourMap: { value: this.colourMap },
        uRange: { value: new Vector2(0, 1) },
        uCoverageCut: { value: COVERAGE_CUT_MASK },
        uGridOrigin: { value: new Vector2() },
        uCellSize: { value: 1 },
        uGridSize: { value: new Vector2(1, 1) },
        uNearest: { value: false },
      },
      depthTest: false,
      depthWrite: false,
    });
    this.object = new Mesh(new BufferGeometry(), material);
    this.object.renderOrder = renderOrder;
    this.object.frustumCulled = false;
    this.object.visible = false;
  }

  /** Nearest-cell colouring (cheap) while the user drags; smooth masked blending otherwise. */
  setNearest(nearest: boolean): void {
    this.object.material.uniforms.uNearest.value = nearest;
  }

  /** Upload a new field. NaN cells become value 0 with mask 0; the mask keeps them out of every pixel. */
  setField(field: FieldImage | null): void {
    if (field && field.values.length !== field.nx * field.ny) {
      throw new RangeError(`Field has ${field.values.length} values for ${field.nx} x ${field.ny} cells.`);
    }
    const hadField = this.field !== null;
    this.field = field;
    if (field) this.upload(field);
    else {
      this.values?.dispose();
      this.mask?.dispose();
      this.values = this.mask = null;
    }
    // With an outline the mesh is the outline's triangles, whatever the field's grid: a new field over an old one
    // (each drag step, right after setClip built the mesh) keeps it.
    if (!this.clip || hadField !== (field !== null)) this.rebuildGeometry();
  }

  /** Fill the value and mask textures, reusing them when the grid keeps its size (each drag step) so the GPU
   * updates them in place rather than allocating two new textures. */
  private upload(field: FieldImage): void {
    const { nx, ny } = field;
    if (!this.values || !this.mask || this.values.image.width !== nx || this.values.image.height !== ny) {
      this.values?.dispose();
      this.mask?.dispose();
      this.values = gridTexture(new Float32Array(nx * ny), nx, ny);
      this.mask = gridTexture(new Uint8Array(nx * ny), nx, ny);
    }
    const vals = this.values.image.data as Float32Array;
    const mask = this.mask.image.data as Uint8Array;
    for (let k = 0; k < nx * ny; k++) {
      const v = field.values[k];
      const fluid = Number.isFinite(v);
      vals[k] = fluid ? v : 0;
      mask[k] = fluid ? 255 : 0;
    }
    this.values.needsUpdate = this.mask.needsUpdate = true;
    const u = this.object.material.uniforms;
    u.uValues.value = this.values;
    u.uMask.value = this.mask;
    u.uGridOrigin.value.set(field.x0, field.y0);
    u.uCellSize.value = field.h;
    // ivec2 in GLSL: three uploads the Vector2 with uniform2i.
    u.uGridSize.value.set(nx, ny);
  }

  /** Triangles of the outline to clip the field to (exact wall edges), or null to clip by the cell mask alone. */
  setClip(clip: Triangles | null): void {
    this.clip = clip;
    this.rebuildGeometry();
  }

  setRange(range: ValueRange): void {
    this.object.material.uniforms.uRange.value.set(range.min, range.max);
  }

  private rebuildGeometry(): void {
    this.object.geometry.dispose();
    const geometry = new BufferGeometry();
    const f = this.field;
    if (f) {
      const tri = this.clip ?? rectangle(f.x0, f.y0, f.x0 + f.nx * f.h, f.y0 + f.ny * f.h);
      geometry.setAttribute('position', new BufferAttribute(tri.positions, 3));
      geometry.setIndex(new BufferAttribute(tri.indices, 1));
    }
    this.object.geometry = geometry;
    this.object.material.uniforms.uCoverageCut.value = this.clip ? COVERAGE_CUT_OUTLINE : COVERAGE_CUT_MASK;
    this.object.visible = f !== null;
  }

  dispose(): void {
    this.object.geometry.dispose();
    this.object.material.dispose();
    this.values?.dispose();
    this.mask?.dispose();
    this.colourMap.dispose();
  }
}

function rectangle(x0: number, y0: number, x1: number, y1: number): Triangles {
  return {
    positions: Float32Array.from([x0, y0, 0, x1, y0, 0, x1, y1, 0, x0, y1, 0]),
    indices: Uint32Array.from([0, 1, 2, 0, 2, 3]),
  };
}
