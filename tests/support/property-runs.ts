/**
 * How many generated inputs a property test tries. Under mutation testing (vitest.mutation.config.mts sets
 * MUTATION_PROPERTY_RUNS) every mutant reruns the properties that reach it, so the count is capped there;
 * `npm test` always runs the number the test asks for.
 */
export function propertyRuns(numRuns: number): number {
  const cap = Number(process.env.MUTATION_PROPERTY_RUNS);
  return Number.isInteger(cap) && cap > 0 ? Math.min(numRuns, cap) : numRuns;
}
