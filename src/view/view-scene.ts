/** The WebGL side of the view: renderer, orthographic camera in section units, and the drawn layers in order. */

import { Color, Group, OrthographicCamera, Scene, WebGLRenderer, type Object3D } from 'three';
import type { ContourLine } from './contour-lines.ts';
import { FieldLayer } from './field-layer.ts';
import { FlagLayer } from './flag-layer.ts';
import { LineLayer } from './line-layer.ts';
import { polygonTriangles } from './polygon-mesh.ts';
import type { FlagShapes, FluidClip, FieldImage, Polyline, ValueRange, ViewLayers, WallLine } from './types.ts';
import {
  BACKGROUND,
  CONTOUR_CASING_STYLE,
  CONTOUR_STYLE,
  INLET_STYLE,
  OUTLET_STYLE,
  STREAMLINE_STYLE,
  WALL_STYLE,
} from './view-style.ts';
import { visibleBounds, type ViewState } from './view-transform.ts';

/** Draw order, bottom to top: field, contours, streamlines, flags, walls (walls stay crisp on top of everything). */
const ORDER = { field: 0, casing: 1, contours: 2, streamlines: 3, flags: 4, walls: 10 } as const;

/**
 * While a point is dragged the picture is drawn at this fraction of the screen's resolution and scaled up by the
 * browser: a quarter of the pixels to shade. On software WebGL it took the pointer-to-repaint median from 100-114 ms
 * to 78-80 ms (measured in the drag benchmark before the other drag changes). Line widths stay in CSS px.
 */
const DRAG_RESOLUTION = 0.5;

export class ViewScene {
  readonly renderer: WebGLRenderer;
  private readonly scene = new Scene();
  private readonly camera = new OrthographicCamera(-1, 1, 1, -1, -1, 1);
  private readonly field = new FieldLayer(ORDER.field);
  private readonly casing = new LineLayer(CONTOUR_CASING_STYLE, ORDER.casing);
  private readonly contours = new LineLayer(CONTOUR_STYLE, ORDER.contours);
  private readonly streamlines = new LineLayer(STREAMLINE_STYLE, ORDER.streamlines);
  private readonly flags = new FlagLayer(ORDER.flags);
  private readonly walls = new LineLayer(WALL_STYLE, ORDER.walls);
  private readonly inlets = new LineLayer(INLET_STYLE, ORDER.walls + 1);
  private readonly outlets = new LineLayer(OUTLET_STYLE, ORDER.walls + 2);
  private readonly groups: Record<keyof ViewLayers, Group>;
  private size = { width: 1, height: 1, pixelRatio: 1 };
  private interactive = false;

  constructor(parent: HTMLElement) {
    this.renderer = new WebGLRenderer({ antialias: true, alpha: false });
    this.renderer.setClearColor(new Color(BACKGROUND), 1);
    const canvas = this.renderer.domElement;
    canvas.style.position = 'absolute';
    canvas.style.left = canvas.style.top = '0';
    canvas.style.display = 'block';
    parent.appendChild(canvas);
    this.groups = {
      field: group(this.field.object),
      contours: group(this.casing.object, this.contours.object),
      streamlines: group(this.streamlines.object),
      flags: group(this.flags.group),
      walls: group(this.walls.object, this.inlets.object, this.outlets.object),
    };
    for (const g of Object.values(this.groups)) this.scene.add(g);
  }

  /** Cheaper drawing while a point is dragged: nearest-cell field at reduced resolution. */
  setInteractive(on: boolean): void {
    if (on === this.interactive) return;
    this.interactive = on;
    this.field.setNearest(on);
    this.applySize();
  }

  /** Throws RangeError when the grid is larger than this GPU's biggest texture. */
  setField(field: FieldImage | null): void {
    const limit = this.renderer.capabilities.maxTextureSize;
    if (field && Math.max(field.nx, field.ny) > limit) {
      throw new RangeError(
        `The grid is too fine to draw here (${Math.max(field.nx, field.ny)} cells across; this screen allows ${limit}). Choose a coarser grid detail.`,
      );
    }
    this.field.setField(field);
  }

  /** The outline is triangulated once here for both the field and the hatched cells. */
  setClip(clip: FluidClip | null): void {
    const tris = clip ? polygonTriangles(clip.outer, clip.holes) : null;
    this.field.setClip(tris);
    this.flags.setClip(tris);
  }

  setRange(range: ValueRange): void {
    this.field.setRange(range);
  }

  setContours(lines: readonly ContourLine[]): void {
    const flat = lines.map((l) => ({ xy: l.xy, closed: false }));
    this.casing.setLines(flat);
    this.contours.setLines(flat);
  }

  setStreamlines(lines: readonly Polyline[]): void {
    this.streamlines.setLines(lines);
  }

  setWalls(walls: readonly WallLine[]): void {
    this.walls.setLines(walls.filter((w) => w.kind === 'wall'));
    this.inlets.setLines(walls.filter((w) => w.kind === 'inlet'));
    this.outlets.setLines(walls.filter((w) => w.kind === 'outlet'));
  }

  setFlags(flags: FlagShapes): void {
    this.flags.setFlags(flags);
  }

  setLayers(layers: ViewLayers): void {
    for (const key of Object.keys(this.groups) as (keyof ViewLayers)[]) this.groups[key].visible = layers[key];
  }

  /** Container size in CSS px and the device pixel ratio; lines keep their CSS px widths. */
  setSize(width: number, height: number, pixelRatio: number): void {
    this.size = { width, height, pixelRatio };
    this.applySize();
    this.flags.setPixelRatio(pixelRatio);
  }

  private applySize(): void {
    const { width, height, pixelRatio } = this.size;
    this.renderer.setPixelRatio(this.interactive ? pixelRatio * DRAG_RESOLUTION : pixelRatio);
    this.renderer.setSize(width, height, true);
  }

  render(view: ViewState): void {
    const b = visibleBounds(view);
    this.camera.left = b.minX;
    this.camera.right = b.maxX;
    this.camera.bottom = b.minY;
    this.camera.top = b.maxY;
    this.camera.updateProjectionMatrix();
    for (const l of [this.inlets, this.outlets]) l.setScale(view.scale);
    this.flags.setScale(view.scale);
    this.renderer.render(this.scene, this.camera);
  }

  /** Frames rendered so far (three's count). */
  get frames(): number {
    return this.renderer.info.render.frame;
  }

  /** GPU objects still alive, for leak checks: three counts them as they are created and disposed. */
  get memory(): { geometries: number; textures: number } {
    return { ...this.renderer.info.memory };
  }

  /** Free every geometry, material and texture; the renderer and its canvas go last. */
  disposeLayers(): void {
    for (const l of [this.field, this.casing, this.contours, this.streamlines, this.flags, this.walls, this.inlets, this.outlets]) {
      l.dispose();
    }
    this.scene.clear();
  }

  disposeRenderer(): void {
    const gl = this.renderer.getContext();
    this.renderer.renderLists.dispose();
    this.renderer.dispose();
    // Browsers keep only a few WebGL contexts alive; give this one back now rather than at garbage collection.
    gl.getExtension('WEBGL_lose_context')?.loseContext();
    this.renderer.domElement.remove();
  }
}

function group(...objects: Object3D[]): Group {
  const g = new Group();
  g.add(...objects);
  return g;
}
