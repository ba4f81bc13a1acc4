import { afterEach } from "vitest";
import { cleanup } from "@testing-library/react";

// Testing Library only auto-cleans when test globals are on; this project keeps them off.
afterEach(() => {
  cleanup();
});
