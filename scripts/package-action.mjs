// Builds the Action's bundle in dist/ (npm run package): TypeScript → ESM JavaScript in build/package
// (no type check: `npm run lint` does that), then @vercel/ncc → dist/index.js and its chunks. The output
// depends only on the sources and the installed packages, so CI can rebuild it and compare
// (git diff --exit-code dist/).
//
// One rewrite happens between the two steps: a dynamic import whose argument is not a string literal
// (the module adapter loading the user's optimizer file) is marked `webpackIgnore`, so the bundler leaves
// it to Node.js at run time instead of replacing it with an empty module map.
import { execFileSync } from "node:child_process";
import { readdirSync, readFileSync, rmSync, statSync, writeFileSync } from "node:fs";
import { join } from "node:path";

const out = "build/package";
for (const dir of [out, "dist"]) rmSync(dir, { recursive: true, force: true });
const bin = (name) => join("node_modules", ".bin", name);
execFileSync(bin("tsc"), ["-p", "tsconfig.action.json"], { stdio: "inherit" });

const DYNAMIC = /\bimport\((?!\s*["'`]|\s*\/\*\s*webpackIgnore)/g;
let marked = 0;
const walk = (dir) => {
  for (const name of readdirSync(dir).sort()) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) walk(path);
    else if (name.endsWith(".js")) {
      const text = readFileSync(path, "utf8");
      const next = text.replace(DYNAMIC, () => {
        marked++;
        return "import(/* webpackIgnore: true */ ";
      });
      if (next !== text) writeFileSync(path, next);
    }
  }
};
walk(out);
execFileSync(
  bin("ncc"),
  ["build", join(out, "action", "main.js"), "-o", "dist", "--license", "licenses.txt", "--quiet"],
  {
    stdio: "inherit",
  },
);
console.log(`dist/ written (${marked} dynamic import(s) left to Node.js)`);
