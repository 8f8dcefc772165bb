/**
 * The Service section of the reports: every contract number shown with its method and
 * source, 80 columns in text, pure ASCII in ASCII mode, US units on request, and the
 * in-full wording without clamped parts.
 */
import {describe, expect, it} from 'vitest';
import {checkJoint, JointInputSchema, type JointInputDraft} from '../../src/core/joint/index.js';
import {checkService, ServiceInputSchema, type ServiceInputDraft} from '../../src/core/service/index.js';
import {serviceMarkdown, serviceText} from '../../src/report/service-text.js';
import {formatCheckText} from '../../src/report/text.js';

const JOINT: JointInputDraft = {thread: 'M12x1.75', boltGrade: '8.8', internal: 'nut', nutClass: '8', engagement: 10};

function service(s: ServiceInputDraft, joint: JointInputDraft = JOINT) {
  const input = JointInputSchema.parse(joint);
  const result = checkJoint(input);
  return {input, result, service: checkService(input, result, ServiceInputSchema.parse(s))};
}

const FULL: ServiceInputDraft = {clamp: [{thickness: 3, material: 'steel'}, {thickness: 15, material: 'AlSi9Cu3-DC'}, {thickness: 15, material: 'steel'}], serviceLoad: {min: 1000, max: 12_000}, serviceTemperature: -20, transverseLoad: 800, boltLength: 50};

describe('service section', () => {
  it('text: each number with its method, lines within 80 columns, SI and US, Unicode and ASCII', () => {
    const {service: s} = service(FULL);
    for (const units of ['si', 'us'] as const) {
      for (const ascii of [false, true]) {
        const text = serviceText(s, {units, ascii});
        for (const line of text.split('\n')) expect(Array.from(line).length, line).toBeLessThanOrEqual(80);
        if (ascii) expect(/^[\x09\x0a\x0d\x20-\x7e]*$/.test(text)).toBe(true);
        for (const word of ['Bolt stiffness', 'Joint constant C', 'Separation load', 'Embedding loss', 'Thermal change', 'Preload retained', 'Yield (proof) factor', 'Load factor', 'Separation factor', 'Goodman', 'Alternating stress', 'Endurance strength', 'Pressure under the head', 'Slip factor', 'Eq. 8-17', 'Eq. 8-30', 'Table 8-17']) {
          expect(text, word).toContain(word);
        }
        expect(text).toContain(units === 'si' ? 'kN/mm' : 'klbf/in');
      }
    }
  });
  it('markdown: a "## Service state" section with tables and the sources', () => {
    const {service: s} = service(FULL);
    const md = serviceMarkdown(s, {units: 'si'});
    expect(md.startsWith('## Service state')).toBe(true);
    expect(md).toContain('| Joint constant C |');
    expect(md).toContain('### Service sources');
  });
  it('without clamped parts it says the load is taken in full', () => {
    const {service: s} = service({}, {...JOINT, serviceLoad: 5000});
    expect(serviceText(s, {units: 'si'})).toContain('taken in full by the bolt');
  });
  it('fits the existing report as an extra section', () => {
    const {input, result, service: s} = service(FULL);
    const text = formatCheckText(result, input, {units: 'si', extraSections: [serviceText(s, {units: 'si'})]});
    expect(text).toContain('SERVICE STATE');
    expect(text.indexOf('SERVICE STATE')).toBeLessThan(text.indexOf('CAUTION'));
  });
});
