// A small terminal model: enough of VT100/ECMA-48 to tell what a stream of bytes
// leaves on screen (characters with their colour and style, cursor moves, erase).
// Used by the tests (test/support/virtual-terminal.ts) and by the bench, which
// compares the screen before and after a key to find the least a writer must send.

const blankStyle = '';

/** The SGR state after applying `params` (e.g. "0;1;31") to `style` (a normalised state). */
export function applySgr(style, params) {
  const flags = new Set();
  let fg = '';
  let bg = '';
  for (const part of style === '' ? [] : style.split(' ')) {
    if (part.startsWith('fg=')) fg = part.slice(3);
    else if (part.startsWith('bg=')) bg = part.slice(3);
    else flags.add(part);
  }
  const p = params === '' ? [0] : params.split(';').map(x => (x === '' ? 0 : Number(x)));
  for (let i = 0; i < p.length; i++) {
    const n = p[i];
    if (n === 0) {
      flags.clear();
      fg = '';
      bg = '';
    } else if (n === 22) {
      flags.delete('1');
      flags.delete('2');
    } else if (n >= 23 && n <= 29) flags.delete(String(n - 20));
    else if (n >= 1 && n <= 9) flags.add(String(n));
    else if ((n >= 30 && n <= 37) || (n >= 90 && n <= 97)) fg = String(n);
    else if (n === 39) fg = '';
    else if ((n >= 40 && n <= 47) || (n >= 100 && n <= 107)) bg = String(n);
    else if (n === 49) bg = '';
    else if (n === 38 || n === 48) {
      const len = p[i + 1] === 5 ? 3 : p[i + 1] === 2 ? 5 : 1;
      const v = p.slice(i, i + len).join(':');
      if (n === 38) fg = v;
      else bg = v;
      i += len - 1;
    }
  }
  return [...[...flags].sort(), fg && `fg=${fg}`, bg && `bg=${bg}`].filter(Boolean).join(' ');
}

export class VirtualTerminal {
  constructor(columns = 80, rows = 24) {
    this.columns = columns;
    this.rows = rows;
    this.row = 0;
    this.col = 0;
    this.pen = blankStyle;
    this.grid = Array.from({length: rows}, () => this.blankRow());
    this.styles = Array.from({length: rows}, () => Array(columns).fill(blankStyle));
  }
  blankRow() {
    return Array(this.columns).fill(' ');
  }
  /** Erase cells [from, to) of a row. Erased cells keep the pen's background, as xterm does (bce). */
  eraseLine(from, to, row = this.row) {
    const bg = this.pen.split(' ').filter(p => p.startsWith('bg=')).join(' ');
    for (let c = from; c < to; c++) {
      this.grid[row][c] = ' ';
      this.styles[row][c] = bg;
    }
  }
  scroll() {
    this.grid.shift();
    this.grid.push(this.blankRow());
    this.styles.shift();
    this.styles.push(Array(this.columns).fill(blankStyle));
  }
  write(data) {
    const re = /\u001B\[(\??)([0-9;]*)([A-Za-z])|\u001B[78]|([\s\S])/gu;
    for (const m of data.matchAll(re)) {
      if (m[4] !== undefined) {
        const ch = m[4];
        if (ch === '\r') this.col = 0;
        else if (ch === '\b') this.col = Math.max(0, Math.min(this.col, this.columns - 1) - 1);
        else if (ch === '\n') {
          this.row++;
          if (this.row >= this.rows) {
            this.scroll();
            this.row = this.rows - 1;
          }
        } else {
          if (this.col >= this.columns) continue;
          this.grid[this.row][this.col] = ch;
          this.styles[this.row][this.col] = this.pen;
          this.col++;
        }
        continue;
      }
      if (m[3] === undefined || m[1] === '?') continue;
      const params = m[2].split(';').map(x => (x === '' ? undefined : Number(x)));
      const n = params[0] || 1;
      // A cursor left in the column past the end (after writing the last cell) is in the last column.
      const col = Math.min(this.col, this.columns - 1);
      switch (m[3]) {
        case 'm':
          this.pen = applySgr(this.pen, m[2]);
          break;
        case 'H':
          this.row = Math.min(this.rows - 1, (params[0] ?? 1) - 1);
          this.col = Math.min(this.columns - 1, (params[1] ?? 1) - 1);
          break;
        case 'A':
          this.row = Math.max(0, this.row - n);
          this.col = col;
          break;
        case 'B':
          this.row = Math.min(this.rows - 1, this.row + n);
          this.col = col;
          break;
        case 'C':
          this.col = Math.min(this.columns - 1, col + n);
          break;
        case 'D':
          this.col = Math.max(0, col - n);
          break;
        case 'X':
          this.eraseLine(col, Math.min(this.columns, col + n));
          break;
        case 'G':
          this.col = Math.min(this.columns - 1, (params[0] ?? 1) - 1);
          break;
        case 'E':
          this.row = Math.min(this.rows - 1, this.row + n);
          this.col = 0;
          break;
        case 'K': {
          const mode = params[0] ?? 0;
          if (mode === 2) this.eraseLine(0, this.columns);
          else if (mode === 1) this.eraseLine(0, col + 1);
          else this.eraseLine(col, this.columns);
          break;
        }
        case 'J': {
          if ((params[0] ?? 0) === 2) {
            for (let r = 0; r < this.rows; r++) this.eraseLine(0, this.columns, r);
            break;
          }
          this.eraseLine(col, this.columns);
          for (let r = this.row + 1; r < this.rows; r++) this.eraseLine(0, this.columns, r);
          break;
        }
        default:
          break;
      }
    }
  }
  /** Screen text, trailing spaces and trailing empty lines removed. */
  text() {
    return this.grid
      .map(r => r.join('').trimEnd())
      .join('\n')
      .replace(/\n+$/, '');
  }
  /** Each row as "char/style" runs, for comparing colour and style too (blank unstyled cells at a row's end left out). */
  styledRows() {
    return this.grid.map((r, i) => {
      let end = r.length;
      while (end > 0 && r[end - 1] === ' ' && this.styles[i][end - 1] === blankStyle) end--;
      return r.slice(0, end).map((ch, c) => [ch, this.styles[i][c]]);
    });
  }
  /** A copy of the characters on screen. */
  snapshot() {
    return this.grid.map(r => [...r]);
  }
}

/**
 * The UTF-8 bytes of the characters that differ between two snapshots, leaving
 * out cells that became blank: the least any writer has to send to get from one
 * screen to the other, before cursor moves, colours and erasing.
 */
export function changedCharacterBytes(before, after) {
  let bytes = 0;
  for (let r = 0; r < after.length; r++)
    for (let c = 0; c < after[r].length; c++) {
      const ch = after[r][c];
      if (ch !== before[r]?.[c] && ch !== ' ') bytes += Buffer.byteLength(ch);
    }
  return bytes;
}
