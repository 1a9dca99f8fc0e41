#!/usr/bin/env node
// The `flexura` bin. All logic is in runCli (run.ts) and the I/O in node-io.ts, both tested;
// this file only hands the process's arguments to them and sets the exit code.
import { nodeIo } from "./node-io.js";
import { runCli } from "./run.js";

process.exitCode = runCli(process.argv.slice(2), nodeIo());
