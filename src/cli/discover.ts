/**
 * PATH… → the claim files to check (CLAIMS.md): a file is taken as given, a folder
 * is searched recursively for `*.claim`, sorted so that runs are reproducible. A
 * missing or unreadable path, or a folder without claims, is a problem to report
 * (exit 2) but never stops the other paths.
 */
import { readdirSync, statSync, type Dirent } from 'node:fs';
import { join, resolve } from 'node:path';

export interface ClaimFilePath {
  /** As the user will recognise it in reports: the PATH given, or PATH/relative for a folder's files. */
  readonly display: string;
  readonly absolute: string;
}

export interface Discovery {
  readonly files: readonly ClaimFilePath[];
  readonly problems: readonly string[];
}

const CLAIM_EXTENSION = '.claim';

function errorText(e: unknown): string {
  const code = typeof e === 'object' && e !== null && 'code' in e ? String(e.code) : '';
  if (code === 'ENOENT' || code === 'ENOTDIR') return 'no such file or folder';
  if (code === 'EACCES' || code === 'EPERM') return 'permission denied';
  return e instanceof Error ? e.message : String(e);
}

/** A directory entry that is (or links to) a regular file; symlinked folders are not followed, so a link loop cannot recurse. */
function isFileEntry(entry: Dirent, absolute: string): boolean {
  if (entry.isFile()) return true;
  if (!entry.isSymbolicLink()) return false;
  try {
    return statSync(absolute).isFile();
  } catch {
    return false;
  }
}

function searchFolder(display: string, absolute: string, out: ClaimFilePath[], problems: string[]): void {
  let entries: Dirent[];
  try {
    entries = readdirSync(absolute, { withFileTypes: true });
  } catch (e) {
    problems.push(`cannot read folder ${display}: ${errorText(e)}`);
    return;
  }
  for (const entry of entries) {
    const d = join(display, entry.name);
    const a = join(absolute, entry.name);
    if (entry.isDirectory()) searchFolder(d, a, out, problems);
    else if (entry.name.endsWith(CLAIM_EXTENSION) && isFileEntry(entry, a)) out.push({ display: d, absolute: a });
  }
}

function byDisplay(a: ClaimFilePath, b: ClaimFilePath): number {
  return a.display < b.display ? -1 : a.display > b.display ? 1 : 0;
}

export function discoverClaimFiles(paths: readonly string[], cwd: string): Discovery {
  const files: ClaimFilePath[] = [];
  const problems: string[] = [];
  const seen = new Set<string>();
  const add = (f: ClaimFilePath): void => {
    // The same file named twice (directly and through its folder) is checked once.
    if (!seen.has(f.absolute)) files.push(f);
    seen.add(f.absolute);
  };
  for (const path of paths) {
    const absolute = resolve(cwd, path);
    let isFolder: boolean;
    try {
      isFolder = statSync(absolute).isDirectory();
    } catch (e) {
      problems.push(`${path}: ${errorText(e)}`);
      continue;
    }
    if (!isFolder) {
      add({ display: path, absolute });
      continue;
    }
    const found: ClaimFilePath[] = [];
    searchFolder(path, absolute, found, problems);
    if (found.length === 0) problems.push(`${path}: the folder contains no *${CLAIM_EXTENSION} file`);
    found.sort(byDisplay).forEach(add);
  }
  return { files, problems };
}
