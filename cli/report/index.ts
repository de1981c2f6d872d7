// The briefing PDF writer of the command line (see docs/briefing.md).
export { writeBriefingPdf, briefingDocument, CHROMIUM_FLAGS, type BriefingPdfOptions, type PaperSize } from './write-briefing-pdf.js';
export { chromiumExecutable, DEFAULT_CHROMIUM, HOW_TO_GET_CHROMIUM } from './chromium-path.js';
