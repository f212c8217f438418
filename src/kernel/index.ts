// The kernel: what every other folder of src/ may use and which imports none of them — field
// validation with one message style, errors that keep their cause, immutable patching, CSV rows
// checked by valibot schemas, and the caution text.
export { numberIn, integerIn, numberAtLeast, oneOf, textUpTo, requiredText, flag, formatIssues, validateWith, validateOnce, type FieldProblem } from "./validate";
export { setIn, getIn, diff, mergeDiff, sameValue } from "./patch";
export { messageOf, failure } from "./errors";
export { CAUTION } from "./caution";
export { CsvError, type CsvProblem } from "./csv-table";
export { parseSchemaCsv, rowsToCsv, csvRowSpec, type CsvColumn } from "./schema-csv";
export { readableUnit, wholeNumber } from "./units";
