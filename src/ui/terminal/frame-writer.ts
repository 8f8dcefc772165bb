/**
 * A stdout for Ink that repaints only the cells that changed.
 *
 * Ink 6.8 redraws the whole frame on every update (about 1.7 KB at 80x24), and
 * its incremental mode leaves ghost lines (fixed only in Ink 7, which needs
 * Node 22). This writer sits between Ink and the terminal: it recognises Ink's
 * frame writes (erase the old lines, then the new text ending in a newline),
 * compares the new frame with the one on screen cell by cell, and writes only
 * the changed runs at absolute positions. The frame is anchored at the top of
 * the alternate screen (the launcher homes the cursor first), so a position is
 * never relative to where the cursor happens to be. Anything else Ink writes
 * (cursor show/hide, a clear on resize or exit) passes through unchanged, and
 * the next frame is then painted in full.
 */
import {EventEmitter} from 'node:events';
import {isSurelyNarrow} from './narrow.js';

const SYNC_BEGIN = '\u001B[?2026h';
const SYNC_END = '\u001B[?2026l';
/** Ink's eraseLines(n): n-1 times "erase line, up one", then "erase line, column 1". */
const ERASE_PREFIX = /^(?:\u001B\[2K\u001B\[1A)*\u001B\[2K\u001B\[G/;
/** Text made only of characters and colour/style sequences. */
const PLAIN_OR_SGR = /^(?:[^\u001B]|\u001B\[[0-9;]*m)*$/;

interface Cell {
  ch: string;
  style: string;
}

interface Attrs {
  flags: Set<string>;
  fg: string;
  bg: string;
}

function applySgr(a: Attrs, params: string): void {
  const p = params === '' ? [0] : params.split(';').map(Number);
  for (let i = 0; i < p.length; i++) {
    const n = p[i]!;
    if (n === 0) {
      a.flags.clear();
      a.fg = '';
      a.bg = '';
    } else if (n === 22) {
      a.flags.delete('1');
      a.flags.delete('2');
    } else if (n >= 23 && n <= 29) a.flags.delete(String(n - 20));
    else if (n >= 1 && n <= 9) a.flags.add(String(n));
    else if ((n >= 30 && n <= 37) || (n >= 90 && n <= 97)) a.fg = String(n);
    else if (n === 39) a.fg = '';
    else if ((n >= 40 && n <= 47) || (n >= 100 && n <= 107)) a.bg = String(n);
    else if (n === 49) a.bg = '';
    else if (n === 38 || n === 48) {
      const len = p[i + 1] === 5 ? 3 : p[i + 1] === 2 ? 5 : 1;
      const v = p.slice(i, i + len).join(';');
      if (n === 38) a.fg = v;
      else a.bg = v;
      i += len - 1;
    }
  }
}

/** The parts of each style key seen, to go from one style to another without a full reset. */
const styleParts = new Map<string, {flags: string[]; fg: string; bg: string}>([['', {flags: [], fg: '', bg: ''}]]);

function styleOf(a: Attrs): string {
  const flags = [...a.flags].sort();
  const key = [...flags, a.fg, a.bg].filter(Boolean).join(';');
  if (!styleParts.has(key)) styleParts.set(key, {flags, fg: a.fg, bg: a.bg});
  return key;
}

/**
 * The shortest SGR that turns style `from` into style `to` (both keys from
 * styleOf): only the parts that change when no attribute has to be turned off,
 * otherwise a reset followed by the whole of `to`.
 */
export function sgrBetween(from: string, to: string): string {
  if (from === to) return '';
  if (to === '') return '\u001B[m';
  const reset = `\u001B[0;${to}m`;
  const a = styleParts.get(from);
  const b = styleParts.get(to);
  if (!a || !b || a.flags.some(f => !b.flags.includes(f))) return from === '' ? `\u001B[${to}m` : reset;
  const params = b.flags.filter(f => !a.flags.includes(f));
  if (a.fg !== b.fg) params.push(b.fg === '' ? '39' : b.fg);
  if (a.bg !== b.bg) params.push(b.bg === '' ? '49' : b.bg);
  const step = `\u001B[${params.join(';')}m`;
  return step.length < reset.length ? step : reset;
}

/** Split one frame line into cells; undefined when it holds a character of uncertain width. */
export function toCells(line: string): Cell[] | undefined {
  const attrs: Attrs = {flags: new Set(), fg: '', bg: ''};
  const cells: Cell[] = [];
  let style = '';
  for (let i = 0; i < line.length; i++) {
    const c = line.charCodeAt(i);
    if (c === 0x1b) {
      // Only colour and style sequences (ESC [ digits and ; m) can be placed cell by cell.
      if (line.charCodeAt(i + 1) !== 0x5b) return undefined;
      let j = i + 2;
      for (let d = line.charCodeAt(j); (d >= 0x30 && d <= 0x39) || d === 0x3b; d = line.charCodeAt(++j));
      if (line.charCodeAt(j) !== 0x6d) return undefined;
      applySgr(attrs, line.slice(i + 2, j));
      style = styleOf(attrs);
      i = j;
      continue;
    }
    // Surrogates (characters beyond the BMP) are never surely narrow.
    if (!isSurelyNarrow(c)) return undefined;
    cells.push({ch: line[i]!, style});
  }
  return cells;
}

/** An absolute position (1-based); a column of 1 may be left out. */
const at = (row: number, col: number) => (col === 1 ? (row === 1 ? '\u001B[H' : `\u001B[${row}H`) : `\u001B[${row};${col}H`);
/** A move right or left by n on the same line (n > 0 is right). Backspaces for one or two to the left. */
const horizontal = (n: number) => (n === 0 ? '' : n > 0 ? (n === 1 ? '\u001B[C' : `\u001B[${n}C`) : n >= -2 ? '\b'.repeat(-n) : `\u001B[${-n}D`);
/**
 * Bytes a move costs on the wire. A line feed counts twice: the terminal driver's
 * output mapping (ONLCR, which Node's raw mode keeps on) sends it as CR LF.
 */
const wireLength = (s: string) => {
  let n = s.length;
  for (let i = s.indexOf('\n'); i >= 0; i = s.indexOf('\n', i + 1)) n++;
  return n;
};

/**
 * The bytes that turn `prev` (on screen) into `next`, both lists of frame lines,
 * on a terminal `columns` wide. The cursor is moved by whichever is shorter: an
 * absolute position, a move right on the same line, or CR LF to the next line.
 */
export function diffFrames(prev: readonly string[], next: readonly string[], columns = Number.POSITIVE_INFINITY): string {
  let out = '';
  let pen = '';
  // Where the cursor is (0-based), or -1 when not known.
  let curRow = -1;
  let curCol = -1;
  const moveTo = (r: number, c: number) => {
    const options = [at(r + 1, c + 1)];
    // Relative moves need a known cursor that is not past the last column (where a
    // terminal holds a pending wrap and moves differ).
    if (curRow >= 0 && curCol >= 0 && curCol < columns) {
      const fromStart = c === 0 ? '' : horizontal(c);
      if (r === curRow) options.push(horizontal(c - curCol), `\r${fromStart}`);
      else if (r > curRow) {
        const down = r - curRow === 1 ? '\u001B[B' : `\u001B[${r - curRow}B`;
        options.push(down + horizontal(c - curCol), `\r${down}${fromStart}`);
        if (r - curRow === 1) options.push(`\r\n${fromStart}`);
      }
    }
    let best = options[0]!;
    for (const o of options) if (wireLength(o) < wireLength(best)) best = o;
    out += best;
    curRow = r;
    curCol = c;
  };
  const setPen = (style: string) => {
    out += sgrBetween(pen, style);
    pen = style;
  };
  for (let r = 0; r < next.length; r++) {
    const a = prev[r] ?? '';
    const b = next[r]!;
    if (a === b) continue;
    const ca = toCells(a);
    const cb = toCells(b);
    if (!ca || !cb) {
      setPen('');
      moveTo(r, 0);
      out += `${b}\u001B[0m\u001B[K`;
      curRow = -1; // the width of what was written is not known
      continue;
    }
    const blank: Cell = {ch: ' ', style: ''};
    const same = (i: number) => {
      const x = ca[i] ?? blank;
      const y = cb[i] ?? blank;
      return x.ch === y.ch && x.style === y.style;
    };
    const width = Math.max(ca.length, cb.length);
    const cost = (k: number) => Buffer.byteLength(cb[k]!.ch);
    let i = 0;
    while (i < cb.length) {
      if (same(i)) {
        i++;
        continue;
      }
      // A run of changes; a stretch of equal cells inside it is rewritten when
      // that is cheaper than a jump (a move right costs 4 or 5 bytes).
      let end = i + 1;
      let gapBytes = 0;
      for (let j = end; j < cb.length; j++) {
        if (!same(j)) {
          end = j + 1;
          gapBytes = 0;
        } else {
          gapBytes += cost(j);
          if (gapBytes > 5) break;
        }
      }
      moveTo(r, i);
      let k = i;
      while (k < end) {
        // Blank stretches are erased (ECH) rather than written as spaces.
        let blanks = 0;
        while (k + blanks < end && cb[k + blanks]!.ch === ' ' && cb[k + blanks]!.style === '') blanks++;
        if (blanks >= 8) {
          setPen('');
          out += `\u001B[${blanks}X`;
          k += blanks;
          if (k < end) {
            out += `\u001B[${blanks}C`;
            curCol += blanks;
          }
          continue;
        }
        setPen(cb[k]!.style);
        out += cb[k]!.ch;
        curCol++;
        k++;
      }
      i = end;
    }
    if (ca.length > cb.length) {
      let tailDiffers = false;
      for (let k = cb.length; k < width; k++) if (!same(k)) tailDiffers = true;
      if (tailDiffers) {
        setPen('');
        moveTo(r, cb.length);
        out += '\u001B[K';
      }
    }
  }
  if (prev.length > next.length) {
    setPen('');
    moveTo(next.length, 0);
    out += '\u001B[J';
  }
  setPen('');
  return out;
}

/** Paint a whole frame from the top-left corner. */
export function paintFrame(next: readonly string[]): string {
  return `\u001B[H${next.map(l => `${l}\u001B[0m\u001B[K`).join('\r\n')}\r\n\u001B[J`;
}

export interface FrameWriter extends EventEmitter {
  readonly isTTY: true;
  readonly columns: number;
  readonly rows: number;
  write(chunk: string, encodingOrCallback?: unknown, callback?: unknown): boolean;
  /** Bytes passed to the terminal so far (for the bench). */
  bytesWritten: number;
  /** Forget what is on screen: the next frame is painted in full. */
  invalidate(): void;
}

/** Wrap a terminal stream; Ink writes to the wrapper. */
export function createFrameWriter(out: NodeJS.WriteStream): FrameWriter {
  let screen: string[] | undefined;
  const emitter = new EventEmitter() as FrameWriter;
  let done: (() => void) | undefined;
  /** Where Ink believes the cursor is (the line below the frame), once we have moved it elsewhere. */
  let park = '';
  const send = (s: string) => {
    const cb = done;
    done = undefined;
    if (s === '') {
      if (cb) out.write('', cb);
      return true;
    }
    emitter.bytesWritten += Buffer.byteLength(s);
    return cb ? out.write(s, cb) : out.write(s);
  };
  Object.defineProperties(emitter, {
    isTTY: {value: true},
    columns: {get: () => out.columns},
    rows: {get: () => out.rows},
  });
  emitter.bytesWritten = 0;
  emitter.invalidate = () => {
    screen = undefined;
  };
  emitter.write = (chunk: string, a?: unknown, b?: unknown) => {
    done = (typeof a === 'function' ? a : typeof b === 'function' ? b : undefined) as (() => void) | undefined;
    const data = String(chunk);
    if (data === SYNC_BEGIN || data === SYNC_END) return send(data);
    const body = data.replace(ERASE_PREFIX, '');
    if (!body.endsWith('\n') || !PLAIN_OR_SGR.test(body)) {
      screen = undefined;
      // Ink's own sequences move relative to where it left the cursor: put it back there first.
      const before = park;
      park = '';
      return send(before + data);
    }
    const lines = body.slice(0, -1).split('\n');
    const bytes = screen ? diffFrames(screen, lines, out.columns || Number.POSITIVE_INFINITY) : paintFrame(lines);
    screen = lines;
    // The cursor is hidden, so it may stay where the last change left it; it is put back
    // where Ink believes it is (the line below the frame) before any write of Ink's own.
    park = at(lines.length + 1, 1);
    return send(bytes);
  };
  out.on('resize', () => {
    // A resize may reflow or clear what is on screen: paint the next frame in full.
    screen = undefined;
    emitter.emit('resize');
  });
  return emitter;
}
