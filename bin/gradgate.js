#!/usr/bin/env node
// Command-line entry: the compiled CLI lives in build/ (npm run build).
import { main } from "../build/cli/main.js";

process.exitCode = await main(process.argv.slice(2));
