/** Dev-only page for the bench panel's browser check: the panel in a side bar as wide as the app's, with areas of an invented head. */

import { mountBenchPanel, type BenchPanel } from '../../../src/app/bench-panel/panel.ts';
import { BENCH_STORAGE_KEY } from '../../../src/app/bench-panel/store.ts';

/** An invented 46 mm valve at 10 mm lift on a 91 % throat: areas in m² as the app would send them. */
export const DEMO_AREAS_M2 = {
  curtain: Math.PI * 0.046 * 0.010,
  throat: (Math.PI / 4) * (0.91 * 0.046) ** 2,
  valveHead: (Math.PI / 4) * 0.046 ** 2,
};

const sent: number[] = [];
const host = document.getElementById('side')!;
let panel: BenchPanel = mountBenchPanel(host, { onInletSpeed: (ms) => sent.push(ms) });

declare global {
  interface Window {
    harness: { ready: boolean; panel: () => BenchPanel; sent: number[]; remount: () => void; demoAreas: typeof DEMO_AREAS_M2 };
  }
}

window.harness = {
  ready: true,
  panel: () => panel,
  sent,
  demoAreas: DEMO_AREAS_M2,
  /** A fresh panel, as on a first visit: the old one is disposed and what it kept is forgotten. */
  remount: () => {
    panel.dispose();
    localStorage.removeItem(BENCH_STORAGE_KEY);
    panel = mountBenchPanel(host, { onInletSpeed: (ms) => sent.push(ms) });
  },
};
