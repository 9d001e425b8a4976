/** What the view shows of each solve: outline, field against the chosen reference, lines and flags, failure marks. */
import type { PortDocument } from '../document/types.ts';
import type { FlowDomain } from '../solver/types.ts';
import type { FlowView } from '../view/flow-view.ts';
import type { FieldImage } from '../view/types.ts';
import type { FailureReply, FieldReply } from '../workers/protocol.ts';
import { flagShapes } from './flag-shapes.ts';
import type { SolveKind } from './live-solve.ts';
import { fluidClip, wallLines } from './section-shapes.ts';
import { parseLevels, type AppSettings } from './settings.ts';
import { thinPolyline } from './thin-polyline.ts';

const NO_FLAGS = { hatched: [], lines: [], markers: [] };

export class FlowPicture {
  /** Mean speed ratio of the tightest station in the last full solve; null before one or when it has none. */
  private tightestMeanRatio: number | null = null;
  /** A failed solve's place is marked on the section. */
  private failureMarked = false;

  constructor(
    private readonly view: FlowView,
    private readonly settings: Pick<AppSettings, 'reference' | 'contourLevels'>,
    private readonly units: () => PortDocument['units'],
  ) {}

  /** Walls, inlet, outlet and the fluid outline the field is clipped to. */
  outline(domain: FlowDomain): void {
    this.view.setWalls(wallLines(domain));
    this.view.setClip(fluidClip(domain));
  }

  /** A drag begins: contours, streamlines and flags of the last full solve no longer fit the shape. */
  dragStarted(): void {
    this.view.setContourLevels([]);
    this.view.setStreamlines([]);
    this.view.setFlags(NO_FLAGS);
  }

  /** A solve came back: mid-drag its outline comes with it; a full solve brings back contours and flags. Drawn at once. */
  solved(reply: FieldReply, kind: SolveKind, domain: FlowDomain): void {
    if (kind === 'drag') this.outline(domain);
    // A marker left by a preview that failed goes when a later one solves (the full solve redraws all flags).
    if (kind === 'drag' && this.failureMarked) this.view.setFlags(NO_FLAGS);
    this.failureMarked = false;
    this.field(reply);
    // After the field: contours are then traced once, on the new field (the view skips levels it already has).
    if (kind === 'full') this.view.setContourLevels(parseLevels(this.settings.contourLevels));
    this.view.renderNow();
  }

  /** A solve failed: mark where the solver says the trouble is (e.g. where a passage closes), if it says. */
  failed(failure: FailureReply, kind: SolveKind, domain: FlowDomain): void {
    if (kind === 'drag') this.outline(domain);
    const markers = failure.where ? [{ x: failure.where[0], y: failure.where[1], label: 'here' }] : [];
    this.view.setFlags({ hatched: [], lines: [], markers });
    this.failureMarked = markers.length > 0;
  }

  /**
   * The field with speed ratios against the chosen reference (again after that setting changes). A drag preview
   * has no reading (no stations): it keeps the tightest station of the last full solve, so its colours match the
   * colour bar held through the drag.
   */
  field(reply: FieldReply): void {
    if (reply.reading) {
      const tightest = reply.reading.tightest ? reply.reading.stations[reply.reading.tightest.index] : null;
      this.tightestMeanRatio = tightest ? tightest.meanSpeedRatio : null;
    }
    const ratio = this.tightestMeanRatio;
    const scale = this.settings.reference === 'tightest station' && ratio ? 1 / ratio : 1;
    const values = scale === 1 ? reply.speedRatio : reply.speedRatio.map((v) => v * scale);
    const clearPeak = reply.peak.speedRatio * scale;
    const field: FieldImage = { nx: reply.nx, ny: reply.ny, x0: reply.x0, y0: reply.y0, h: reply.h, values, clearPeak };
    this.view.setField(field);
    if (reply.reading) {
      this.view.setStreamlines(reply.reading.streamlines.map((s) => ({ xy: thinPolyline(s.xy, 2 * reply.h), closed: false })));
      this.view.setFlags(flagShapes(reply, this.units()));
    }
  }
}
