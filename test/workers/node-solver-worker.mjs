// Starts the TypeScript worker entry under tsx inside a Node worker thread.
import { tsImport } from 'tsx/esm/api';

await tsImport('./node-solver-worker.ts', import.meta.url);
