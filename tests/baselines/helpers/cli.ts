// Runs the gradgate CLI from the sources (for tests that need a real child process).
import { main } from "../../../src/cli/main.js";

process.exitCode = await main(process.argv.slice(2));
