/**
 * The grammar's railroad diagrams as one self-contained HTML page. Chevrotain's
 * generator links its scripts and stylesheet from a CDN, which fails offline, so the
 * links are replaced by the files themselves, read from the installed package.
 */
import { createSyntaxDiagramsCode } from './chevrotain-runtime.js';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { claimParser } from './parser.js';

/** Marks where the generator puts resource URLs, so they can be found and replaced. */
const PLACEHOLDER = 'sturmcheck-inline:';

const SCRIPTS = ['vendor/railroad-diagrams.js', 'src/diagrams_builder.js', 'src/diagrams_behavior.js', 'src/main.js'];

export function syntaxDiagramsHtml(): string {
  const resources = diagramResourceDirectory();
  let html = createSyntaxDiagramsCode(claimParser.getSerializedGastProductions(), {
    resourceBase: PLACEHOLDER,
    css: `${PLACEHOLDER}diagrams.css`,
  });
  html = html.replace(
    `<link rel='stylesheet' href='${PLACEHOLDER}diagrams.css'>`,
    () => `<style>\n${readFileSync(join(resources, 'diagrams.css'), 'utf8')}\n</style>`,
  );
  for (const script of SCRIPTS) {
    html = html.replace(
      `<script src='${PLACEHOLDER}${script}'></script>`,
      () => `<script>\n${inlineSafe(readFileSync(join(resources, script), 'utf8'))}\n</script>`,
    );
  }
  html = html.replace('<!DOCTYPE html>', '<!DOCTYPE html>\n<title>Claim file grammar</title>');
  if (html.includes(PLACEHOLDER)) throw new Error('a diagram resource was not inlined');
  return html.replace(/[ \t]+$/gm, '').trimStart();
}

/** Chevrotain's package exports only its entry point, whose folder locates the rest. */
function diagramResourceDirectory(): string {
  const entry = createRequire(import.meta.url).resolve('chevrotain');
  return join(dirname(entry), '..', '..', 'diagrams');
}

/** A literal `</script>` inside an inlined script would end it early. */
function inlineSafe(script: string): string {
  return script.replace(/<\/script/gi, '<\\/script');
}
