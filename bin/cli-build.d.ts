// Types of bin/cli-build.js, for the test setup that builds the command and the tests of the build itself.

/** Where the command is built from (`repo`, holding src/cli/main.ts) and to (`outDir`). */
export interface BuildLayout {
  readonly repo: string;
  readonly outDir: string;
}
/** The project's own layout: this repository, dist-cli/. */
export declare const LAYOUT: BuildLayout;
/** Absolute path of the bundled command of a layout (outDir/portwright.js). */
export declare function bundlePath(layout?: BuildLayout): string;
/** 'missing', 'stale', or null when the bundle is current. */
export declare function bundleState(layout?: BuildLayout): 'missing' | 'stale' | null;
/** Builds the bundle; resolves to the build's wall time in ms. */
export declare function buildBundle(layout?: BuildLayout): Promise<number>;
/** Builds the bundle when missing or stale; null when it was current. */
export declare function ensureBundle(layout?: BuildLayout): Promise<{ state: 'missing' | 'stale'; ms: number } | null>;
