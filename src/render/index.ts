export {renderHtml} from './html.js';
export {openBrowser, type PdfBrowser, type PdfOptions} from './pdf.js';
export type {Report, ReportSeries} from './types.js';
