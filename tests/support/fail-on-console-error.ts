import { afterEach, beforeEach, vi } from "vitest";

// An unexpected console.error is a bug somewhere: fail the test that caused it.
let errors: unknown[][] = [];
beforeEach(() => {
  errors = [];
  vi.spyOn(console, "error").mockImplementation((...args: unknown[]) => {
    errors.push(args);
  });
});
afterEach(() => {
  vi.restoreAllMocks();
  if (errors.length > 0) {
    throw new Error(`console.error was called:\n${errors.map((a) => a.map(String).join(" ")).join("\n")}`);
  }
});
