/**
 * Reports built from core results: the terminal text report and the Markdown
 * work-order report of a joint check, and the ranked repair plan as text and Markdown.
 */
export {formatCheckText, toAscii, wrapText, TEXT_WIDTH} from './text.js';
export {formatCheckMarkdown, isoDate, type MarkdownMeta, type WorkOrderNotes} from './markdown.js';
export {verdict, levelWord} from './sections.js';
export {planText, lengthText} from './repair-text.js';
export {planMarkdown, planSectionLines, type RepairReportMeta} from './repair-markdown.js';
export {screwText, screwRows} from './screw-text.js';
export {screwMarkdown} from './screw-markdown.js';
export {reportFacts, workOrderFields, signOff, type WorkOrderMeta} from './work-order.js';
