import { z } from "zod";

// Runs in the browser before any of our code. Zod probes for eval (`new Function`) the first time
// an object schema is built; under our Content-Security-Policy that probe is refused and reported
// as a violation. Without eval Zod parses the same way, only without its compiled fast path.
z.config({ jitless: true });
