/**
 * FlowView: the flow-field picture on a container element. It draws what the app gives it (field, walls,
 * streamlines, flags) and owns pan and zoom; it computes no physics.
 *
 * Editor overlay: the app puts its own SVG or canvas inside the container (absolute, inset 0, added after the view
 * so it sits on top) and follows pan and zoom through onViewChange, whose SectionToScreen maps section units to CSS
 * px: as SVG, transform="matrix(scale 0 0 -scale offsetX offsetY)". Pointer events that bubble from it to the
 * container pan the view unless the app claims them (claimPointer returns true, or the handler calls
 * preventDefault on pointerdown) or panEnabled is false.
 */

import { ColourBar } from './colour-bar.ts';
import { LabelOverlay } from './label-overlay.ts';
import { PointerControls } from './pointer-controls.ts';
import { composeSnapshot } from './snapshot.ts';
import type * as T from './types.ts';
import type { FlowViewOptions, ViewDiagnostics } from './types.ts';
import { ViewContent } from './view-content.ts';
import { ViewScene } from './view-scene.ts';
import { ViewNavigator } from './view-navigator.ts';
import * as VT from './view-transform.ts';

export class FlowView {
  /** False stops all drag panning (wheel zoom still works). */
  panEnabled = true;
  /** Asked on every pointerdown: return true when the editor takes this pointer (x, y in section units). */
  claimPointer: ((ev: PointerEvent, x: number, y: number) => boolean) | null = null;

  private readonly container: HTMLElement;
  private readonly scene: ViewScene;
  private readonly overlay: LabelOverlay;
  private readonly colourBar: ColourBar;
  private readonly controls: PointerControls;
  private readonly resizeObserver: ResizeObserver;
  private readonly content = new ViewContent();
  private readonly nav = new ViewNavigator(() => this.requestRender());
  private readonly restoreContainer: () => void;
  private pixelRatio = 1;
  private frame = 0;
  private disposed = false;
  private interactive = false;
  /** False until a field has set the automatic range; a drag then holds it. */
  private rangeFitted = false;

  /** Throws RangeError (before touching the page) when options.colourRange is fixed with its top not above its bottom. */
  constructor(container: HTMLElement, options: FlowViewOptions = {}) {
    const c = this.content;
    c.units = options.units ?? c.units;
    c.levels = options.contourLevels ?? c.levels;
    c.colourRange = options.colourRange ?? c.colourRange;
    c.layers = { ...c.layers, ...options.layers };
    c.updateRange();
    this.container = container;
    this.restoreContainer = prepareContainer(container);
    this.scene = new ViewScene(container);
    this.overlay = new LabelOverlay(container);
    this.colourBar = new ColourBar(container);
    this.scene.setLayers(c.layers);
    this.scene.setRange(c.range);
    this.controls = new PointerControls(container, {
      panEnabled: () => this.panEnabled,
      claims: (ev) => this.claims(ev),
      pan: (dx, dy) => this.nav.userMove(VT.panBy(this.nav.state, dx, dy)),
      zoom: (f, px, py) => this.nav.userMove(VT.zoomAbout(this.nav.state, f, px, py)),
    });
    this.resizeObserver = new ResizeObserver(() => this.resize());
    this.resizeObserver.observe(container);
    this.resize();
  }

  /**
   * While the user drags a point: draw cheaply (cell by cell, at reduced resolution), hold the colour range still
   * so speeds are seen rising and falling against one scale, and do not refit the view to the changing outline.
   * Set back to false when the drag ends.
   */
  setInteractive(on: boolean): void {
    if (on === this.interactive) return;
    this.interactive = on;
    this.scene.setInteractive(on);
    if (!on) {
      this.applyRange();
      this.contentChanged();
    } else this.requestRender();
  }

  /** Show a field (or none). Contours and the automatic colour range follow it. Throws RangeError for a field
   * whose values do not fill its grid or that is too large for the GPU; the previous field then stays. */
  setField(field: T.FieldImage | null): void {
    this.scene.setField(field);
    this.content.field = field;
    this.refreshContours();
    if (!this.interactive || !this.rangeFitted) this.applyRange();
    this.rangeFitted ||= field !== null;
    this.contentChanged();
  }

  /** Clip the field and contours to the fluid outline (exact wall edges), or null to clip by the field's cells. */
  setClip(clip: T.FluidClip | null): void {
    this.content.clip = clip;
    this.scene.setClip(clip);
    this.refreshContours();
    this.contentChanged();
  }

  /** The same levels again (each settings change, each full solve) trace nothing: the contours already follow them. */
  setContourLevels(levels: T.ContourLevels): void {
    const now = this.content.levels;
    if (levels.length === now.length && levels.every((v, k) => v === now[k])) return;
    this.content.levels = [...levels];
    this.refreshContours();
    this.requestRender();
  }

  /** 'auto' or a fixed range; throws RangeError for a fixed range whose top is not above its bottom. */
  setColourRange(range: T.ColourRange): void {
    const before = this.content.colourRange;
    this.content.colourRange = range;
    try {
      this.applyRange();
    } catch (e) {
      this.content.colourRange = before;
      throw e;
    }
    this.requestRender();
  }

  /** The speed ratios at the bottom and top of the colour map now. */
  get colourRange(): T.ValueRange {
    return this.content.range;
  }

  setStreamlines(lines: readonly T.Polyline[]): void {
    this.content.streamlines = lines;
    this.scene.setStreamlines(lines);
    this.requestRender();
  }

  setWalls(walls: readonly T.WallLine[]): void {
    this.content.walls = walls;
    this.scene.setWalls(walls);
    this.contentChanged();
  }

  setFlags(flags: T.FlagShapes): void {
    this.content.flags = flags;
    this.scene.setFlags(flags);
    this.requestRender();
  }

  setLayers(layers: Partial<T.ViewLayers>): void {
    this.content.layers = { ...this.content.layers, ...layers };
    this.scene.setLayers(this.content.layers);
    this.requestRender();
  }

  setUnits(units: T.LengthUnits): void {
    this.content.units = units;
    this.requestRender();
  }

  /** Section point (section units) under a point in CSS px from the container's top left. */
  screenToSection(px: number, py: number): { x: number; y: number } {
    return VT.screenToSection(this.nav.state, px, py);
  }

  /** CSS px from the container's top left of a section point. */
  sectionToScreen(x: number, y: number): { x: number; y: number } {
    return VT.sectionToScreen(this.nav.state, x, y);
  }

  get transform(): T.SectionToScreen {
    return this.nav.transform;
  }

  /** Call `listener` after every pan, zoom, fit or resize; returns a function that stops it. */
  onViewChange(listener: (t: T.SectionToScreen) => void): () => void {
    return this.nav.listen(listener);
  }

  /** Show `bounds` (default: the whole section) in the free area beside the colour bar and scale bar. */
  fitToView(bounds?: T.SectionBounds): void {
    this.nav.fit(bounds ?? this.content.contentBounds());
  }

  /** Zoom by `factor` (> 1 closer) about a screen point in CSS px (default: the centre). */
  zoomBy(factor: number, px = this.nav.state.width / 2, py = this.nav.state.height / 2): void {
    this.nav.userMove(VT.zoomAbout(this.nav.state, factor, px, py));
  }

  /** Ask for one redraw; many calls before the next animation frame make one render. */
  requestRender(): void {
    if (this.frame !== 0 || this.disposed) return;
    this.frame = requestAnimationFrame(() => {
      this.frame = 0;
      this.renderNow();
    });
  }

  /** Draw at once (e.g. before reading pixels); a render already asked for is then not needed. */
  renderNow(): void {
    if (this.disposed) return;
    if (this.frame !== 0) cancelAnimationFrame(this.frame);
    this.frame = 0;
    this.scene.render(this.nav.state);
    this.overlay.draw(this.nav.state, this.content);
  }

  /** The picture with labels and colour bar as one canvas in device px, e.g. for a printed sheet. */
  snapshot(): HTMLCanvasElement {
    this.renderNow();
    return composeSnapshot(this.scene.renderer.domElement, this.overlay.canvas, this.colourBar.canvas, this.pixelRatio);
  }

  /**
   * What the view has drawn, for checks and status lines: the scale bar text (e.g. "10 mm"), contour labels placed
   * in the last frame, frames rendered so far, and GPU geometries and textures alive (both 0 after dispose()).
   */
  get diagnostics(): ViewDiagnostics {
    const o = this.overlay;
    return { scaleBarLabel: o.scaleBarLabel, contourLabels: o.contourLabelCount, frames: this.scene.frames, memory: this.scene.memory };
  }

  /** Free every GPU object, remove the canvases and every listener. The view cannot be used afterwards. */
  dispose(): void {
    if (this.disposed) return;
    this.disposed = true;
    if (this.frame !== 0) cancelAnimationFrame(this.frame);
    this.resizeObserver.disconnect();
    this.controls.dispose();
    this.nav.clear();
    this.scene.disposeLayers();
    this.scene.disposeRenderer();
    this.overlay.dispose();
    this.colourBar.dispose();
    this.restoreContainer();
  }

  private claims(ev: PointerEvent): boolean {
    if (!this.claimPointer) return false;
    const r = this.container.getBoundingClientRect();
    const p = this.screenToSection(ev.clientX - r.left, ev.clientY - r.top);
    return this.claimPointer(ev, p.x, p.y);
  }

  private refreshContours(): void {
    this.content.updateContours();
    this.scene.setContours(this.content.contours);
  }

  private applyRange(): void {
    this.content.updateRange();
    this.scene.setRange(this.content.range);
    this.colourBar.draw(this.content.range, this.content.highest, this.content.clearPeak, this.nav.state.height, this.pixelRatio);
  }

  /** Mid-drag the view does not refit: the point dragged would run away from the pointer. */
  private contentChanged(): void {
    if (!this.interactive) this.nav.contentChanged(this.content.contentBounds());
    this.requestRender();
  }

  private resize(): void {
    const w = Math.max(1, this.container.clientWidth);
    const h = Math.max(1, this.container.clientHeight);
    this.pixelRatio = window.devicePixelRatio || 1;
    this.scene.setSize(w, h, this.pixelRatio);
    this.overlay.setSize(w, h, this.pixelRatio);
    this.colourBar.draw(this.content.range, this.content.highest, this.content.clearPeak, h, this.pixelRatio);
    this.nav.resize(w, h, this.content.contentBounds());
  }
}

/** Make the container a positioned box that clips its layers; returns a function that puts its style back. */
function prepareContainer(container: HTMLElement): () => void {
  const { position, overflow, touchAction } = container.style;
  if (getComputedStyle(container).position === 'static') container.style.position = 'relative';
  container.style.overflow = 'hidden';
  return () => Object.assign(container.style, { position, overflow, touchAction });
}
