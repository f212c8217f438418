// The notebook runtime: reactive cells, controls, page layout, study store, downloads.
export { reactiveCell, staticCell, errorBox, type Cell, type CellContent, type CellOptions } from "./cell";
export { numberControl, selectControl, toggleControl, textControl, controlGroup, type Binding, type NumberControlOptions, type TextControlOptions } from "./controls";
export { startPage, type Page, type PageOptions } from "./page";
export { createStudyStore, type StudyStore } from "./study-store";
export { PAGES, CAUTION, type PageId } from "./pages";
export { downloadText, downloadBlob } from "./download";
export { fmt, tableElement } from "./format";
export { signal, computed, effect, batch, type Signal, type ReadonlySignal } from "@preact/signals-core";
export { chartFigure, svgText, svgToPng } from "./chart";
export { briefControls } from "./brief-controls";
export { keyValues } from "./key-values";
export { schemeOptionControls, memberTable, checkTable, takeoffTable, schemeSummary } from "./scheme-panel";
export { studySignals, type SchemeSignals, type StudySignals } from "./scheme-signals";
export { spanStudyRunner, type SpanStudyState } from "./span-study-runner";
export { clientExportHtml, escapeHtml, type ClientExportInput } from "./client-export";
export { tableEditor, type EditorColumn } from "./table-editor";
export { schemeDesigns, designAreas, type SchemeDesign } from "./scheme-designs";
export { riskInputsEditor, ensureRiskStyle } from "./risk-inputs-editor";
