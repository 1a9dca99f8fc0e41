/** Help texts of the `flexura` command, one per command. */
export const HELP = {
  main: `flexura: beams and cross-sections for the engineers who size them

Usage:
  flexura analyze MODEL.json [--json] [--svg DIR] [--html FILE]
                                                     print the report of a model
  flexura check MODEL.json [MODEL.json ...] [--json] exit non-zero when a check fails
  flexura schema                                     print the JSON Schema of model files
  flexura COMMAND --help                             help on one command
  flexura --version                                  print the version

A file name of - reads the model from standard input. With --json, every failure is one
JSON object on stdout: { "ok": false, "exitCode", "problems": [{ "code", "path", "message" }] }.

Exit codes:
  0  ok (for check: every check passed)
  1  check: at least one check failed
  2  wrong command line (unknown command or option, missing file name)
  3  a file could not be read or written
  4  the model is not valid JSON, not a valid model, or cannot be solved
  5  unexpected failure inside flexura (please report it)
  6  check: a model gives no limits, so nothing was checked (no pass is claimed)

flexura performs an elastic, first-order analysis. You are responsible for the loads,
for code compliance and for review by a licensed engineer. Local codes govern.
`,
  analyze: `Usage: flexura analyze MODEL.json [--json] [--svg DIR] [--html FILE]

Analyses one model file (- for standard input) and prints a readable report: inputs with units, reactions, peaks of
shear, moment, slope and deflection with their locations, section properties, stresses, checks
with utilisation, and the caution.

Options:
  --json       print one JSON object (the results in the model's units, units named) instead
  --svg DIR    also write SVG diagrams into DIR (created if missing): MODEL-member.svg,
               MODEL-shear.svg, MODEL-moment.svg, MODEL-deflection.svg, with a section
               MODEL-section.svg, MODEL-figure.svg (the member, shear, moment and
               deflection stacked on one x axis, as on the calculation sheet), and with
               combinations MODEL-moment-envelope.svg (and the shear and deflection envelopes)
  --html FILE  also write the printable calculation sheet (one self-contained HTML page:
               title block with the program version and the input's SHA-256, inputs, one
               figure, results, checks, method and caution); print it to PDF from a browser
  -h, --help   show this help

Exit codes: 0 analysed (whatever the checks say), 2 usage, 3 file, 4 invalid model, 5 internal.
`,
  check: `Usage: flexura check MODEL.json [MODEL.json ...] [--json]

Analyses each model file and checks it against its limits. Prints one verdict per file
with the governing utilisation. Meant for scripts and CI.

Options:
  --json       print one compact JSON verdict per file, one per line, valid or not:
               { file, ok, pass, exitCode, checks, governing, utilisation, failed, problems }
  -h, --help   show this help

Exit codes: 0 every check of every file passed, 1 at least one check failed, 2 usage,
3 file, 4 invalid model, 5 internal, 6 a model gives no limits (nothing checked, no pass).
`,
  schema: `Usage: flexura schema

Prints the JSON Schema (draft 2020-12) of flexura model files, for editors to validate and
complete them. Save it with: flexura schema > flexura-model.schema.json

Options:
  -h, --help   show this help
`,
} as const;
