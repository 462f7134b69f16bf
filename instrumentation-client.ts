// Runs in the browser before any of our code. Zod probes for eval (`new Function`) the first time
// an object schema is built; under our Content-Security-Policy that probe is refused and reported
// as a violation. Without eval Zod parses the same way, only without its compiled fast path.
// Zod keeps its settings (what `config()` from zod/v4/core writes) on this global, shared by the full
// build and the mini build; setting the flag there directly keeps all of zod out of the first load of
// every page. tests/unit/zod-jitless.test.ts fails if zod stops reading it from there.
const shared = globalThis as { __zod_globalConfig?: { jitless?: boolean } };
(shared.__zod_globalConfig ??= {}).jitless = true;

// A module, not a script: nothing to export, nothing leaks into the global scope.
export {};
