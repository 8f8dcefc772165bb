/**
 * Threads: designation parser, series tables, basic geometry and limits of size.
 * Pure: no I/O. Lengths in mm, areas in mm².
 */
export {parseThread, ACCEPTED_FORMS} from './parse.js';
export {threadGeometry, basicProfile} from './geometry.js';
export {listDesignations, nearestDesignations} from './designations.js';
export {METRIC_SERIES, metricRow} from './metric-series.js';
export {UNIFIED_SERIES, unifiedRow} from './unified-series.js';
export {TRAPEZOIDAL_SERIES, ACME_SERIES} from './power-series.js';
export {parseMetricClass, parseUnifiedClass} from './tolerance-class.js';
export {fromWords, limitsSides, limitsSummary, methodWords, type LimitsSide} from './limits-provenance.js';
