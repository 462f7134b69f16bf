import { config } from "zod/v4/core";

// Runs in the browser before any of our code. Zod probes for eval (`new Function`) the first time
// an object schema is built; under our Content-Security-Policy that probe is refused and reported
// as a violation. Without eval Zod parses the same way, only without its compiled fast path.
// The setting lives in zod's core, which the full build and the mini build share; importing the
// core alone keeps the full build out of every page's first load.
config({ jitless: true });
