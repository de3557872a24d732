/** Runs the CLI from the TypeScript sources (no build): npx tsx scripts/dev-cli.ts run ... */
import { main } from "../src/cli/main.js";

process.exitCode = await main(process.argv.slice(2));
