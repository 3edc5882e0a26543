/**
 * Diagnostics are data (a stable code, a message, a span), appended by every phase
 * instead of thrown; only the command line decides exit codes (ARCHITECTURE.md).
 * The catalogue of codes of the front end is `diagnostic-codes.ts`; later layers add
 * their own codes in their own catalogue files with the same shape.
 */
import type { Span } from './span.js';

export type Severity = 'error' | 'warning';

export interface Diagnostic {
  /** Stable, e.g. `SC-P001`; never reused for a different meaning. */
  readonly code: string;
  readonly severity: Severity;
  readonly message: string;
  /** Null only for file-level conditions with no position (unreadable file). */
  readonly span: Span | null;
  /** Extra lines ("'theta(' opened at 3:14", "did you mean …"). */
  readonly notes?: readonly string[];
}

/** A catalogue entry: the code and a message template with `{name}` holes. */
export interface DiagnosticTemplate {
  readonly code: string;
  readonly severity: Severity;
  readonly template: string;
}

/** Fills a template's `{name}` holes. */
export function diagnostic(
  t: DiagnosticTemplate,
  args: Readonly<Record<string, string | number>>,
  span: Span | null,
  notes?: readonly string[],
): Diagnostic {
  const message = t.template.replace(/\{(\w+)\}/g, (_m, k: string) => {
    const v = args[k];
    return v === undefined ? `{${k}}` : String(v);
  });
  return notes && notes.length > 0
    ? { code: t.code, severity: t.severity, message, span, notes }
    : { code: t.code, severity: t.severity, message, span };
}
