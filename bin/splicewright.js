#!/usr/bin/env node
import { main } from "../dist/cli/main.js";
import { EXIT_OUTPUT_ERROR, outputFailed, watchStandardStreams } from "../dist/cli/output.js";

watchStandardStreams();
main(process.argv).then((code) => {
  // A failed standard output keeps its own code (it may have been reported before main returned).
  process.exitCode = outputFailed() ? EXIT_OUTPUT_ERROR : code;
});
