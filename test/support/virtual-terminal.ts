/**
 * A small terminal model for tests: enough of VT100 to check what a stream of
 * bytes leaves on screen (text, cursor moves, erase). Styles are ignored.
 */
export class VirtualTerminal {
  grid: string[][];
  row = 0;
  col = 0;
  constructor(
    public columns = 80,
    public rows = 24,
  ) {
    this.grid = Array.from({length: rows}, () => Array(columns).fill(' '));
  }
  private eraseLine(from: number, to: number) {
    for (let c = from; c < to; c++) this.grid[this.row]![c] = ' ';
  }
  private scroll() {
    this.grid.shift();
    this.grid.push(Array(this.columns).fill(' '));
  }
  write(data: string): void {
    const re = /\u001B\[\??([0-9;]*)([A-Za-z])|\u001B[78]|([\s\S])/gu;
    for (const m of data.matchAll(re)) {
      if (m[3] !== undefined) {
        const ch = m[3];
        if (ch === '\r') this.col = 0;
        else if (ch === '\n') {
          this.row++;
          if (this.row >= this.rows) {
            this.scroll();
            this.row = this.rows - 1;
          }
        } else {
          if (this.col >= this.columns) continue;
          this.grid[this.row]![this.col] = ch;
          this.col++;
        }
        continue;
      }
      if (m[2] === undefined || m[0].startsWith('\u001B[?')) continue;
      const params = (m[1] ?? '').split(';').map(x => (x === '' ? undefined : Number(x)));
      const n = params[0] ?? 1;
      switch (m[2]) {
        case 'H':
          this.row = Math.min(this.rows - 1, (params[0] ?? 1) - 1);
          this.col = Math.min(this.columns - 1, (params[1] ?? 1) - 1);
          break;
        case 'A':
          this.row = Math.max(0, this.row - n);
          break;
        case 'B':
          this.row = Math.min(this.rows - 1, this.row + n);
          break;
        case 'C':
          this.col = Math.min(this.columns - 1, this.col + n);
          break;
        case 'X':
          this.eraseLine(this.col, Math.min(this.columns, this.col + n));
          break;
        case 'G':
          this.col = (params[0] ?? 1) - 1;
          break;
        case 'E':
          this.row = Math.min(this.rows - 1, this.row + n);
          this.col = 0;
          break;
        case 'K':
          if ((params[0] ?? 0) === 2) this.eraseLine(0, this.columns);
          else this.eraseLine(this.col, this.columns);
          break;
        case 'J': {
          const keep = this.row;
          this.eraseLine(this.col, this.columns);
          for (let r = keep + 1; r < this.rows; r++) this.grid[r] = Array(this.columns).fill(' ');
          if ((params[0] ?? 0) === 2) this.grid = Array.from({length: this.rows}, () => Array(this.columns).fill(' '));
          break;
        }
        default:
          break;
      }
    }
  }
  /** Screen text, trailing spaces and trailing empty lines removed. */
  text(): string {
    return this.grid
      .map(r => r.join('').trimEnd())
      .join('\n')
      .replace(/\n+$/, '');
  }
}
