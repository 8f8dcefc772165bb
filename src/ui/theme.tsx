/**
 * Colour and symbol choices, made once at start-up and read through a context.
 * With colour off every colour is undefined, so Ink emits no colour codes at
 * all (its colour library ignores NO_COLOR). Every state also has a word or a
 * symbol, so nothing depends on colour alone.
 */
import React, {createContext, useContext} from 'react';

export type Tone = 'ok' | 'watch' | 'fail' | 'info' | 'accent' | 'dim';

export interface Theme {
  color: boolean;
  ascii: boolean;
  tone(t: Tone): string | undefined;
  sym: {
    barFull: string;
    barEmpty: string;
    mark: string;
    pointer: string;
    cursor: string;
    select: string;
    sep: string;
    arrow: string;
    ellipsis: string;
    mid: string;
  };
}

const COLOURS: Record<Tone, string> = {ok: 'green', watch: 'yellow', fail: 'red', info: 'cyan', accent: 'cyan', dim: 'gray'};

export function makeTheme(color: boolean, ascii: boolean): Theme {
  return {
    color,
    ascii,
    tone: t => (color ? COLOURS[t] : undefined),
    sym: ascii
      ? {barFull: '#', barEmpty: '.', mark: '|', pointer: '^', cursor: '_', select: '>', sep: '|', arrow: '->', ellipsis: '...', mid: '-'}
      : {barFull: '█', barEmpty: '·', mark: '│', pointer: '▲', cursor: '▏', select: '▶', sep: '│', arrow: '→', ellipsis: '…', mid: '·'},
  };
}

const ThemeContext = createContext<Theme>(makeTheme(false, true));

export function ThemeProvider({theme, children}: {theme: Theme; children: React.ReactNode}) {
  return <ThemeContext.Provider value={theme}>{children}</ThemeContext.Provider>;
}

export function useTheme(): Theme {
  return useContext(ThemeContext);
}

/** Cut a string to a width, marking the cut. */
export function fit(text: string, width: number, ellipsis: string): string {
  if (width <= 0) return '';
  const chars = Array.from(text);
  if (chars.length <= width) return text;
  const e = Array.from(ellipsis);
  return chars.slice(0, Math.max(0, width - e.length)).join('') + ellipsis;
}

/** Pad (or cut) to exactly a width. */
export function pad(text: string, width: number, ellipsis = '~'): string {
  const t = fit(text, width, ellipsis);
  return t + ' '.repeat(Math.max(0, width - Array.from(t).length));
}

/** Word-wrap to a width, at most `maxLines` lines (the last is cut with the ellipsis). */
export function wrap(text: string, width: number, maxLines: number, ellipsis: string): string[] {
  const words = text.split(/\s+/).filter(Boolean);
  const lines: string[] = [];
  let line = '';
  for (const w of words) {
    const next = line === '' ? w : `${line} ${w}`;
    if (Array.from(next).length <= width) line = next;
    else {
      if (line !== '') lines.push(line);
      line = w;
    }
  }
  if (line !== '') lines.push(line);
  if (lines.length > maxLines) {
    const kept = lines.slice(0, maxLines);
    kept[maxLines - 1] = fit(`${kept[maxLines - 1]} ${lines.slice(maxLines).join(' ')}`, width, ellipsis);
    return kept.map(l => fit(l, width, ellipsis));
  }
  return lines.map(l => fit(l, width, ellipsis));
}
