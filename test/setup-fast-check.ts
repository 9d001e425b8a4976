/** Generated inputs use a fixed seed: every run checks the same cases, so CI cannot pass or fail by chance. */
import fc from 'fast-check';

fc.configureGlobal({ seed: 20261202 });
