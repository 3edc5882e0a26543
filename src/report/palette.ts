/**
 * The colours of the terminal report, by role. The chalk instance gets an explicit
 * level: the command line alone decides whether colour is wanted (terminal,
 * `--no-color`, `NO_COLOR`), and chalk's own detection would second-guess it.
 */
import { Chalk } from 'chalk';

export type Paint = (text: string) => string;

export interface Palette {
  readonly good: Paint;
  readonly bad: Paint;
  readonly doubt: Paint;
  readonly faint: Paint;
  readonly strong: Paint;
}

export function palette(color: boolean): Palette {
  // Level 1 (16 colours) is understood by every colour terminal.
  const c = new Chalk({ level: color ? 1 : 0 });
  return { good: c.green, bad: c.red, doubt: c.yellow, faint: c.dim, strong: c.bold };
}
