/** `gradgate merge`: combine the results of shards 1…n (run --shard i/n) into the whole suite's results. */
import { existsSync, readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative, resolve } from "node:path";
import { InputError } from "../core/errors.js";
import { canonicalJson } from "../core/json.js";
import { writeFileAtomic } from "../io/files.js";
import type { ResultsDocument } from "../runner/results.js";
import { mergeShards, type NamedResults } from "../runner/shard.js";
import { EXIT, type Host } from "./host.js";

export interface MergeArgs {
  /** Shard results files, or directories whose *.json files are shard results (e.g. downloaded artifacts). */
  readonly inputs: readonly string[];
  readonly out: string;
  readonly quiet: boolean;
}

/**
 * Expands the inputs into files: a file as given, a directory into the *.json files anywhere below it
 * (artifact downloads put each shard in a folder of its own), sorted so the order never depends on the
 * file system. Paths are shown relative to the working directory.
 */
export function shardFiles(cwd: string, inputs: readonly string[]): string[] {
  const files: string[] = [];
  for (const input of inputs) {
    const path = resolve(cwd, input);
    if (!existsSync(path)) throw new InputError(`merge: ${input}: no such file or directory`);
    if (statSync(path).isDirectory()) {
      const found = jsonFilesBelow(path);
      if (found.length === 0) throw new InputError(`merge: ${input}: the directory holds no .json files`);
      files.push(...found);
    } else files.push(path);
  }
  return [...new Set(files)].sort();
}

function jsonFilesBelow(dir: string): string[] {
  const out: string[] = [];
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) out.push(...jsonFilesBelow(path));
    else if (entry.isFile() && entry.name.endsWith(".json")) out.push(path);
  }
  return out;
}

/** Reads the shard files and merges them (see src/runner/shard.ts). */
export function readAndMerge(cwd: string, inputs: readonly string[]): ResultsDocument {
  const parts: NamedResults[] = shardFiles(cwd, inputs).map((path) => {
    const name = relative(cwd, path) || path;
    let doc: unknown;
    try {
      doc = JSON.parse(readFileSync(path, "utf8"));
    } catch (err) {
      throw new InputError(`merge: ${name} is not valid JSON (${(err as Error).message})`);
    }
    return { name, doc: doc as ResultsDocument };
  });
  return mergeShards(parts);
}

export function mergeCommand(host: Host, args: MergeArgs): number {
  if (args.inputs.length === 0) {
    throw new InputError("merge: name the shard results files (or directories holding them)");
  }
  const doc = readAndMerge(host.cwd, args.inputs);
  writeFileAtomic(resolve(host.cwd, args.out), canonicalJson(doc));
  if (!args.quiet) {
    host.out(`merged ${doc.cases.length} cases, ${doc.suite.runs} runs; results written to ${args.out}\n`);
  }
  return EXIT.ok;
}
