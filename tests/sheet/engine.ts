// flexura's sheet functions loaded into a real spreadsheet engine (HyperFormula, a test-only dependency under
// its GPL-3.0 licence key): a function plugin that hands our functions plain cell values, spills tables, and
// shows our errors as #VALUE! with our message.
import { ArraySize, CellError, EmptyValue, ErrorType, FunctionArgumentType, FunctionPlugin, HyperFormula, SimpleRangeValue } from "hyperformula";

/** The engine's parsed argument and evaluation state, opaque to us: handed back to its own evaluator. */
type Ast = Parameters<FunctionPlugin["runFunction"]>[0][number];
type InterpreterState = Parameters<FunctionPlugin["runFunction"]>[1];
import { isSheetError, sheetFunctions, type CellValue, type SheetFunction, type SheetValue } from "../../src/sheet/index.js";

/** A cell or range value from the engine as plain cells: blanks as null, ranges as rows. */
function plain(value: unknown): unknown {
  if (value instanceof SimpleRangeValue) return value.rawData().map((row) => row.map((c) => plainScalar(c)));
  return plainScalar(value);
}
function plainScalar(value: unknown): CellValue {
  if (value === EmptyValue || value === undefined || value === null) return null;
  if (typeof value === "number" || typeof value === "string" || typeof value === "boolean") return value;
  if (typeof value === "object" && value !== null && "val" in value) return (value as { val: number }).val; // a rich number
  return typeof value === "bigint" ? Number(value) : null;
}

function toEngine(result: SheetValue): unknown {
  if (isSheetError(result)) return new CellError(ErrorType.VALUE, result.message);
  if (Array.isArray(result)) return SimpleRangeValue.onlyValues((result as CellValue[][]).map((row) => row.map((c) => (c === null ? EmptyValue : c))));
  return result;
}

const methodName = (f: SheetFunction): string => f.name.replace(/\W/g, "_").toLowerCase();

class FlexuraPlugin extends FunctionPlugin {
  static override implementedFunctions = Object.fromEntries(
    sheetFunctions.map((f) => [
      f.name,
      {
        method: methodName(f),
        ...(f.returns === "table" ? { sizeOfResultArrayMethod: `${methodName(f)}_size` } : {}),
        parameters: f.parameters.map((_, i) => ({ argumentType: FunctionArgumentType.ANY, ...(i >= f.required ? { optionalArg: true } : {}) })),
      },
    ]),
  );
}

/** Evaluates the call's arguments and runs our function on their plain values. */
function callWith(plugin: FunctionPlugin, f: SheetFunction, ast: { args: Ast[] }, state: InterpreterState): SheetValue {
  const evaluate = (plugin as unknown as { evaluateAst(a: Ast, s: InterpreterState): unknown }).evaluateAst.bind(plugin);
  const args = ast.args.map((a) => plain(evaluate(a, state)));
  return f.call(...args);
}

for (const f of sheetFunctions) {
  const proto = FlexuraPlugin.prototype as unknown as Record<string, unknown>;
  proto[methodName(f)] = function (this: FunctionPlugin, ast: { args: Ast[] }, state: InterpreterState): unknown {
    return toEngine(callWith(this, f, ast, state));
  };
  if (f.returns === "table") {
    proto[`${methodName(f)}_size`] = function (this: FunctionPlugin, ast: { args: Ast[] }, state: InterpreterState): ArraySize {
      const result = callWith(this, f, ast, state);
      if (!Array.isArray(result)) return ArraySize.scalar();
      const rows = result as CellValue[][];
      return new ArraySize(rows[0]?.length ?? 1, rows.length);
    };
  }
}

HyperFormula.registerFunctionPlugin(FlexuraPlugin, { enGB: Object.fromEntries(sheetFunctions.map((f) => [f.name, f.name])) });

/** A new engine with flexura's functions, from sheets of rows. */
export function workbook(sheets: Record<string, (string | number | boolean | null)[][]>): HyperFormula {
  return HyperFormula.buildFromSheets(sheets, { licenseKey: "gpl-v3" });
}
