/** The bench panel's own look, injected once per document: slate panel, warm accent, compact rows for a 330 px side bar. */

const STYLE_ID = 'bench-panel-style';

const CSS = `
.bench-panel { --bench-bg: #1d2127; --bench-field: #262b33; --bench-line: #2e343d; --bench-text: #e3e6ea;
  --bench-muted: #9aa3ad; --bench-accent: #e8a33d; --bench-error: #ff7a6b;
  background: var(--bench-bg); color: var(--bench-text); font: 13px/1.35 system-ui, -apple-system, 'Segoe UI', sans-serif; }
.bench-panel, .bench-panel * { box-sizing: border-box; }
.bench-panel sub { font-size: 0.75em; line-height: 0; }
.bench-panel > summary { cursor: pointer; margin: 6px 0 4px; font-size: 12px; font-weight: 700; text-transform: uppercase;
  letter-spacing: 0.08em; color: var(--bench-muted); }
.bench-panel > summary:hover { color: var(--bench-text); }
.bench-panel h3 { margin: 6px 0 4px; font-size: 12px; text-transform: uppercase; letter-spacing: 0.08em; color: var(--bench-muted); }
.bench-panel h4 { margin: 8px 0 2px; font-size: 11px; font-weight: 600; color: var(--bench-accent); letter-spacing: 0.04em; }
.bench-form { display: grid; grid-template-columns: minmax(0, 1fr) 72px 66px; gap: 3px 4px; align-items: center; }
.bench-form > h4 { grid-column: 1 / -1; }
.bench-form label { font-size: 12px; color: var(--bench-text); }
.bench-panel input, .bench-panel select, .bench-panel button { font: inherit; font-size: 12px; color: var(--bench-text);
  background: var(--bench-field); border: 1px solid var(--bench-line); border-radius: 3px; min-width: 0; }
.bench-panel input { padding: 2px 5px; text-align: right; font-variant-numeric: tabular-nums; width: 100%; }
.bench-panel input::placeholder { color: #6d7580; font-size: 11px; text-align: left; }
.bench-panel input:focus, .bench-panel select:focus, .bench-panel button:focus-visible { outline: 1px solid var(--bench-accent); border-color: var(--bench-accent); }
.bench-panel input[aria-invalid='true'] { border-color: var(--bench-error); }
.bench-panel select { padding: 1px 2px; width: 100%; }
.bench-wide { grid-column: 2 / -1; }
.bench-unit { font-size: 12px; color: var(--bench-muted); padding-left: 3px; }
.bench-error { grid-column: 1 / -1; color: var(--bench-error); font-size: 11px; margin: -1px 0 3px; }
.bench-hint { grid-column: 1 / -1; color: var(--bench-muted); font-size: 11px; margin: -1px 0 3px; text-align: right; }
.bench-field-note { grid-column: 1 / -1; color: var(--bench-muted); font-size: 11px; margin: -1px 0 3px; }
.bench-hint button { all: unset; cursor: pointer; color: var(--bench-accent); text-decoration: underline; }
.bench-error:empty, .bench-hint:empty { display: none; }
.bench-results-head { display: flex; align-items: baseline; justify-content: space-between; gap: 6px; margin-top: 10px; }
.bench-results-head label { font-size: 11px; color: var(--bench-muted); }
.bench-results-head select { width: auto; }
.bench-group { margin: 8px 0 2px; }
.bench-result { display: flex; flex-wrap: wrap; align-items: baseline; gap: 0 8px; padding: 2px 2px 3px;
  border-bottom: 1px solid var(--bench-line); font-size: 12px; }
.bench-result-label { flex: 1 1 auto; }
.bench-value { flex: 0 0 auto; margin-left: auto; text-align: right; white-space: nowrap; font-variant-numeric: tabular-nums; }
.bench-value[data-missing] { color: var(--bench-muted); }
.bench-result[data-flag] .bench-value { color: var(--bench-accent); font-weight: 600; }
.bench-note { flex: 1 0 100%; font-size: 11px; color: var(--bench-muted); }
.bench-note:empty { display: none; }
.bench-scale[hidden] { display: none; }
.bench-scale { display: grid; grid-template-columns: minmax(0, 1fr) auto; gap: 3px 4px; margin-top: 10px; align-items: center; }
.bench-scale > label { grid-column: 1 / -1; font-size: 11px; color: var(--bench-muted); }
.bench-scale button { padding: 3px 8px; cursor: pointer; }
.bench-scale button:hover:not(:disabled) { border-color: var(--bench-accent); }
.bench-scale button:disabled { color: var(--bench-muted); cursor: default; }
.bench-scale-note { grid-column: 1 / -1; font-size: 11px; color: var(--bench-muted); }
.bench-scale-note:empty { display: none; }
`;

/** Adds the panel's style sheet to `doc` unless an earlier panel did. */
export function injectBenchStyles(doc: Document): void {
  if (doc.getElementById(STYLE_ID)) return;
  const style = doc.createElement('style');
  style.id = STYLE_ID;
  style.textContent = CSS;
  doc.head.append(style);
}
