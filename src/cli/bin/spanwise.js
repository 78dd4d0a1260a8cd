#!/usr/bin/env node
/** Command-line entry: `spanwise calc <book.xlsx> ...`, `spanwise start`. See src/cli/main.ts. */
"use strict";
require("./tsHook");
require("../main.ts")
  .main(process.argv.slice(2))
  .then((code) => {
    process.exitCode = code;
  });
