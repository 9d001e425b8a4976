/** Analytic test shapes drawn as a porter would draw them: section files with arc edges, not hand-built polygons. */

/** A one-variant section file (format version 3) around `section`, in millimetres. */
export function sectionFile(title: string, section: unknown): string {
  return JSON.stringify({
    format: 'portwright-section', version: 3, title, units: 'mm', activeVariant: 'base',
    settings: { gridDetail: 'standard' },
    variants: [{ name: 'base', section }],
  });
}

/**
 * Concentric 90-degree bend r1 < r < r2 about the origin (REFERENCES.md 1a): inlet on the x axis, outlet on the
 * y axis, walls two arc edges through their 45-degree points: "short side" (inner) and "long side" (outer).
 */
export function drawnBend(r1: number, r2: number): string {
  const d = Math.SQRT1_2;
  return sectionFile('Concentric bend', {
    outline: {
      vertices: [{ at: [r1, 0] }, { at: [r2, 0] }, { at: [0, r2] }, { at: [0, r1] }],
      edges: [
        { kind: 'line', role: 'inlet' },
        { kind: 'arc', role: 'wall', wallName: 'long side', through: [r2 * d, r2 * d] },
        { kind: 'line', role: 'outlet' },
        { kind: 'arc', role: 'wall', wallName: 'short side', through: [r1 * d, r1 * d] },
      ],
    },
    islands: [],
  });
}

/**
 * Cylinder of diameter `d` centred at the origin between parallel walls `d / dOverH` apart (REFERENCES.md 1c),
 * reaching `widthsEachSide` channel widths up- and downstream: inlet on the left, outlet on the right. The
 * cylinder is an island of three arc edges through the middles of their thirds.
 */
export function drawnCylinder(d: number, dOverH: number, widthsEachSide: number): string {
  const width = d / dOverH, half = widthsEachSide * width, r = d / 2;
  const at = (deg: number): [number, number] => [r * Math.cos((deg * Math.PI) / 180), r * Math.sin((deg * Math.PI) / 180)];
  return sectionFile('Cylinder between walls', {
    outline: {
      vertices: [{ at: [-half, -width / 2] }, { at: [half, -width / 2] }, { at: [half, width / 2] }, { at: [-half, width / 2] }],
      edges: [
        { kind: 'line', role: 'wall', wallName: 'channel wall' },
        { kind: 'line', role: 'outlet' },
        { kind: 'line', role: 'wall', wallName: 'channel wall' },
        { kind: 'line', role: 'inlet' },
      ],
    },
    islands: [{
      name: 'cylinder',
      outline: {
        vertices: [{ at: at(90) }, { at: at(210) }, { at: at(330) }],
        edges: [150, 270, 30].map((deg) => ({ kind: 'arc', role: 'wall', through: at(deg) })),
      },
    }],
  });
}

/**
 * An invented U-bend test piece (mm), 20 long: inlet on x = 0 below a divider, outlet on x = 0 above it, two channels
 * 1 mm wide whatever the divider's thickness, the divider ending 1 mm short of the end wall; solved on `gridDetail`.
 */
export function uBendFile(divider: number, gridDetail = 'standard'): string {
  const top = 2 + divider;
  const at = (x: number, y: number) => ({ at: [x, y] });
  const wall = (wallName: string) => ({ kind: 'line', role: 'wall', wallName });
  const outline = {
    vertices: [at(0, 0), at(20, 0), at(20, top), at(0, top), at(0, 1 + divider), at(19, 1 + divider), at(19, 1), at(0, 1)],
    edges: [wall('floor'), wall('end wall'), wall('roof'), { kind: 'line', role: 'outlet' }, wall('divider'), wall('divider'), wall('divider'), { kind: 'line', role: 'inlet' }],
  };
  return JSON.stringify({
    format: 'portwright-section', version: 3, title: `U-bend test piece, ${divider} mm divider`, units: 'mm', activeVariant: 'bend',
    settings: { gridDetail }, variants: [{ name: 'bend', note: '', section: { outline, islands: [] } }],
  });
}
