/** Turns a flattened flow domain into what the view draws: named wall lines and the fluid clip. */
import { wallRuns } from '../geometry/index.ts';
import { MARK_INLET, MARK_OUTLET, type FlowDomain, type Ring } from '../solver/types.ts';
import type { FluidClip, WallKind, WallLine } from '../view/types.ts';

const KIND_BY_MARK: Readonly<Record<number, WallKind>> = { [MARK_INLET]: 'inlet', [MARK_OUTLET]: 'outlet' };

export function wallLines(domain: FlowDomain): WallLine[] {
  const lines: WallLine[] = [];
  const add = (ring: Ring, closedName?: string) => {
    for (const run of wallRuns(ring)) {
      const kind = KIND_BY_MARK[run.mark] ?? 'wall';
      const name = kind !== 'wall' ? kind : run.wallId >= 0 ? domain.wallNames[run.wallId] : closedName ?? 'wall';
      lines.push({ name, xy: run.xy, kind });
    }
  };
  add(domain.outer);
  domain.islands.forEach((ring) => add(ring, 'island'));
  return lines;
}

export function fluidClip(domain: FlowDomain): FluidClip {
  return {
    outer: { xy: domain.outer.xy, closed: true },
    holes: domain.islands.map((ring) => ({ xy: ring.xy, closed: true })),
  };
}
