// How many times a property runs. The mutation runs (stryker.vitest.config.ts) set MUTATION_PROPERTY_RUNS so
// one mutant costs seconds, not minutes, on a shared machine; every other run keeps the property's own count.
// Fewer runs can only kill fewer mutants, so the score a mutation run prints is a lower bound of the full count's.
export function propertyRuns(runs: number): number {
  const cap = Number(process.env.MUTATION_PROPERTY_RUNS);
  return Number.isFinite(cap) && cap > 0 ? Math.min(runs, cap) : runs;
}
