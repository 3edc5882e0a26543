/**
 * Chevrotain reports a syntax error as an exception whose only payload beyond the
 * token is a message string. To phrase diagnostics ourselves (with the open bracket,
 * the rule's description, our token names) we make that string a small JSON record
 * of what was expected, and decode it in `syntax-errors.ts`.
 */
import type { IParserErrorMessageProvider, TokenType } from 'chevrotain';

export type ParseProblem =
  | { readonly kind: 'mismatch'; readonly expected: readonly string[]; readonly ruleName: string }
  | { readonly kind: 'noAlternative'; readonly expected: readonly string[]; readonly ruleName: string }
  | { readonly kind: 'extraInput'; readonly expected: readonly string[]; readonly ruleName: string };

function firstTokens(paths: readonly (readonly TokenType[])[]): string[] {
  const names = paths.map((path) => path[0]?.name).filter((n): n is string => n !== undefined);
  return [...new Set(names)];
}

function encode(problem: ParseProblem): string {
  return JSON.stringify(problem);
}

export const structuredMessages: IParserErrorMessageProvider = {
  buildMismatchTokenMessage: ({ expected, ruleName }) =>
    encode({ kind: 'mismatch', expected: [expected.name], ruleName }),
  buildNotAllInputParsedMessage: ({ ruleName }) => encode({ kind: 'extraInput', expected: [], ruleName }),
  buildNoViableAltMessage: ({ expectedPathsPerAlt, ruleName }) =>
    encode({ kind: 'noAlternative', expected: firstTokens(expectedPathsPerAlt.flat()), ruleName }),
  buildEarlyExitMessage: ({ expectedIterationPaths, ruleName }) =>
    encode({ kind: 'noAlternative', expected: firstTokens(expectedIterationPaths), ruleName }),
};

export function decodeProblem(message: string): ParseProblem | null {
  try {
    const value: unknown = JSON.parse(message);
    if (typeof value === 'object' && value !== null && 'kind' in value && 'ruleName' in value) {
      return value as ParseProblem;
    }
  } catch {
    // Not one of ours (Chevrotain's own recovery messages); the caller falls back.
  }
  return null;
}
