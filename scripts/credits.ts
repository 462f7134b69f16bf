import { writeFileSync } from "node:fs";
import { join } from "node:path";
import { buildCredits } from "./credits-list";

// Regenerates data/credits.json, which the credits page lists; run after adding or updating a package.
const credits = buildCredits(process.cwd());
writeFileSync(join(process.cwd(), "data", "credits.json"), `${JSON.stringify(credits, null, 2)}\n`);
console.log(
  `data/credits.json: ${credits.direct.length} dependencies, ${credits.included.length} packages they bring`,
);
