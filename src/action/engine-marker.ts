/**
 * The environment variable that marks the engine process: the Action's entry file, started with it set
 * to "1", runs the CLI on its arguments instead of the Action (see src/action/main.ts).
 */
export const ENGINE_MARKER = "GRADGATE_ENGINE_PROCESS";
