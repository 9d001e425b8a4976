/** Worker entry: exposes the solver API over comlink. */
import * as Comlink from 'comlink';
import { createSolverApi } from './solver-api.ts';

Comlink.expose(createSolverApi());
