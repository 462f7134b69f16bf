import type { Models } from "@/models";
import { seedDemo } from "./seed-demo";
import { seedOwnerDemo } from "./owner-demo";
import { seedServiceDemo } from "./service-demo";

/**
 * Every part of the demo, in order: shops, people, vehicles and cases first, then the service side
 * (spec table, cylinders, a finished service record). The seed script and the integration setup
 * both call this, so what the tests check is what `npm run demo` gets. Returns one line per change.
 */
export async function seedAllDemo({
  models,
  passwordHash,
  origin = "http://127.0.0.1:3000",
}: {
  models: Models;
  passwordHash: string;
  /** Where the app serves, for the demo owner-page link the seed prints. */
  origin?: string;
}): Promise<string[]> {
  const { created, skipped } = await seedDemo({ models, passwordHash });
  return [
    ...created.map((name) => `seeded   ${name}`),
    ...skipped.map((name) => `present  ${name} (left as it is)`),
    ...(await seedServiceDemo({ models })).map((name) => `seeded   ${name}`),
    ...(await seedOwnerDemo({ models, origin })).map((name) => `seeded   ${name}`),
  ];
}
