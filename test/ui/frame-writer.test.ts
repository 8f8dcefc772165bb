import {EventEmitter} from 'node:events';
import {describe, expect, it} from 'vitest';
import fc from 'fast-check';
import {createFrameWriter, diffFrames, paintFrame, toCells} from '../../src/ui/terminal/frame-writer.js';
import {VirtualTerminal} from '../support/virtual-terminal.js';

function fakeOut(term: VirtualTerminal) {
  const out = new EventEmitter() as EventEmitter & {columns: number; rows: number; isTTY: boolean; write: (s: string) => boolean; bytes: number};
  out.columns = 80;
  out.rows = 24;
  out.isTTY = true;
  out.bytes = 0;
  out.write = (s: string) => {
    out.bytes += Buffer.byteLength(s);
    term.write(s);
    return true;
  };
  return out;
}

/** What Ink 6.8's standard renderer writes for a frame after one of `prevLines` lines. */
const inkWrite = (frame: string, prevLines: number) =>
  (prevLines > 0 ? `${'\u001B[2K\u001B[1A'.repeat(prevLines - 1)}\u001B[2K\u001B[G` : '') + `${frame}\n`;

describe('frame writer', () => {
  it('leaves exactly the latest frame on screen when frames change content and height', () => {
    const term = new VirtualTerminal();
    const w = createFrameWriter(fakeOut(term) as unknown as NodeJS.WriteStream);
    const frames = [
      ['title', 'value 0', 'line c', 'line d'],
      ['title', 'value 1', 'line c'],
      ['title', 'value 22 longer', 'line c', 'line d', 'line e'],
      ['\u001B[1mtitle\u001B[22m', 'value 3', ''],
    ];
    let prev = 0;
    for (const f of frames) {
      w.write(inkWrite(f.join('\n'), prev));
      prev = f.length + 1;
      expect(term.text()).toBe(f.map(l => l.replace(/\u001B\[[0-9;]*m/g, '')).join('\n').replace(/\n+$/, ''));
    }
    // Ink's own clear (on exit) still lands on the right lines.
    w.write('\u001B[2K\u001B[1A'.repeat(prev - 1) + '\u001B[2K\u001B[G');
    expect(term.text()).toBe('');
  });

  it('writes a few bytes for a one-digit change', () => {
    const a = ['Engaged length      12.0 mm', 'Stripping  48.0 kN'];
    const b = ['Engaged length      12.5 mm', 'Stripping  50.0 kN'];
    const bytes = diffFrames(a, b);
    expect(bytes.length).toBeLessThan(40);
    const term = new VirtualTerminal();
    term.write(`\u001B[H${a.join('\r\n')}`);
    term.write(bytes);
    expect(term.text()).toBe(b.join('\n'));
  });

  it('erases blank stretches instead of writing spaces, and keeps text after them', () => {
    const a = ['left side text here            right 1'];
    const b = ['                                right 2'];
    const bytes = diffFrames(a, b);
    expect(bytes).toContain('X');
    expect(bytes.length).toBeLessThan(30);
    const term = new VirtualTerminal();
    term.write(`\u001B[H${a[0]}`);
    term.write(bytes);
    expect(term.text()).toBe(b[0]);
  });

  it('rewrites a whole line when it holds a character of uncertain width', () => {
    expect(toCells('abc')).toHaveLength(3);
    expect(toCells('a\u4e2d')).toBeUndefined();
    const term = new VirtualTerminal();
    term.write('\u001B[Hname: x');
    term.write(diffFrames(['name: x'], ['name: \u4e2d']));
    expect(term.text()).toBe('name: \u4e2d');
  });

  it('passes other writes through and paints the next frame in full', () => {
    const term = new VirtualTerminal();
    const out = fakeOut(term);
    const w = createFrameWriter(out as unknown as NodeJS.WriteStream);
    w.write(inkWrite('one\ntwo', 0));
    w.write('\u001B[?25h');
    out.emit('resize');
    w.write(inkWrite('one\nthree', 3));
    expect(term.text()).toBe('one\nthree');
  });

  it('any frame followed by any other leaves exactly the other on screen (cursor moves relative and absolute)', () => {
    const piece = fc.constantFrom('a', 'b', ' ', '        ', '1.25', 'kN', '\u00b7', '\u2588', '\u2192', '\u001B[1m', '\u001B[22m', '\u001B[31m', '\u001B[39m', '\u4e2d');
    const line = fc.array(piece, {maxLength: 30}).map(p => p.join(''));
    const frame = fc.array(line, {minLength: 1, maxLength: 12});
    const plain = (l: string) => l.replace(/\u001B\[[0-9;]*m/g, '');
    fc.assert(
      fc.property(frame, frame, (a, b) => {
        const term = new VirtualTerminal(120, 24);
        term.write(paintFrame(a));
        term.write(diffFrames(a, b, 120));
        expect(term.text()).toBe(b.map(l => plain(l).trimEnd()).join('\n').replace(/\n+$/, ''));
      }),
      {numRuns: 400},
    );
  });

  it('any frame followed by any other leaves the same characters, colours and styles as painting it afresh', () => {
    const sgr = ['\u001B[0m', '\u001B[1m', '\u001B[22m', '\u001B[2m', '\u001B[4m', '\u001B[24m', '\u001B[31m', '\u001B[39m', '\u001B[90m', '\u001B[1;33m', '\u001B[42m', '\u001B[49m', '\u001B[38;5;208m', '\u001B[7m'];
    const piece = fc.constantFrom('a', 'b', ' ', '      ', '12.5', '\u00b7', '\u2588', ...sgr);
    const line = fc.array(piece, {maxLength: 30}).map(p => p.join(''));
    const frame = fc.array(line, {minLength: 1, maxLength: 10});
    fc.assert(
      fc.property(frame, frame, fc.integer({min: 20, max: 120}), (a, b, columns) => {
        const fit = (f: string[]) => f.map(l => Array.from(l).length <= columns ? l : '');
        const [x, y] = [fit(a), fit(b)];
        const diffed = new VirtualTerminal(columns, 24);
        diffed.write(paintFrame(x));
        diffed.write(diffFrames(x, y, columns));
        const fresh = new VirtualTerminal(columns, 24);
        fresh.write(paintFrame(y));
        expect(diffed.styledRows()).toEqual(fresh.styledRows());
        // and the writer leaves the pen reset, so whatever Ink writes next is unstyled
        expect(diffed.pen).toBe('');
      }),
      {numRuns: 600},
    );
  });

  it('changes colour by the parts that differ, and resets only when an attribute goes off', () => {
    const red = '\u001B[31m';
    const boldRed = '\u001B[1;31m';
    // plain to red: no reset needed
    expect(diffFrames(['ab'], [`a${red}b`])).toContain('\u001B[31mb');
    // bold red to red: bold must go, so a reset and the colour again
    expect(diffFrames(['xy'], [`${boldRed}a\u001B[22mb`])).toBe('\u001B[H\u001B[1;31ma\u001B[0;31mb\u001B[m');
    // red to bold red: only the bold is added
    expect(diffFrames(['xy'], [`${red}a\u001B[1mb`])).toBe('\u001B[H\u001B[31ma\u001B[1mb\u001B[m');
    // the pen ends reset with the short form
    expect(diffFrames(['ab'], [`a${red}b`]).endsWith('\u001B[m')).toBe(true);
  });

  it('moves the cursor down or left relative to where it is when that is shorter', () => {
    const a = ['Preload    10.6 kN', 'Torque     18.0 N m', 'x'];
    const b = ['Preload    12.6 kN', 'Torque     19.0 N m', 'x'];
    const bytes = diffFrames(a, b, 80);
    // the second change is one line down, same column: a move down, not a position
    expect(bytes).toBe('\u001B[1;13H2\u001B[B\b9');
    const term = new VirtualTerminal();
    term.write(paintFrame(a));
    term.write(bytes);
    expect(term.text()).toBe(b.join('\n'));
  });

  it('moves the cursor right on a line, or to the next line, in fewer bytes than an absolute position', () => {
    const pad = ' '.repeat(10);
    const a = Array.from({length: 12}, (_, i) => `row ${i}`).concat([`Stripping  bolt 64.5 kN, weaker side:${pad}hole 24.7 kN`, 'x']);
    const b = [...a.slice(0, 12), `Stripping  bolt 58.2 kN, weaker side:${pad}hole 22.3 kN`, 'y'];
    const bytes = diffFrames(a, b, 80);
    expect(bytes).toContain('\u001B[13;17H'); // the first change: an absolute position
    expect(bytes).toMatch(/^\u001B\[13;17H58\.2\u001B\[\d+C2\.3/); // then a move right on the same line
    expect(bytes).toContain('\r\ny'); // then the start of the next line
    const term = new VirtualTerminal();
    term.write(paintFrame(a));
    term.write(bytes);
    expect(term.text()).toBe(b.join('\n'));
  });
});
