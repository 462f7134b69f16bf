import fc from "fast-check";
import { propertyRuns } from "./property-runs";

// Under mutation testing only (vitest.mutation.config.mts): properties that keep fast-check's default of
// 100 runs get the same cap as those that ask for a number through propertyRuns().
fc.configureGlobal({ numRuns: propertyRuns(100) });
