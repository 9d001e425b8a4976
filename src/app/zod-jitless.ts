/** Switches zod to its plain parsers before any schema is built: the compiled ones need eval, which the page's CSP refuses. */
import { z } from 'zod';

// Must run before the first schema is constructed (zod decides per schema when it is built), so main.ts imports this
// module first. With jitless set, zod does not even probe `new Function`, so no policy violation is reported.
z.config({ jitless: true });
