/**
 * `recheck` (check/recheck.ts): a certificate re-derived from its claim and closure is
 * confirmed; each kind of tampering is caught at the step it touches; a file of the
 * wrong shape is unusable.
 */
import { describe, expect, it } from 'vitest';
import { certificateOf, recheck, recheckText, DEFAULT_CHECK_OPTIONS, sha256Hex } from '../../src/check/index.js';
import type { Certificate } from '../../src/verdict/index.js';
import { checkText } from '../helpers/check.js';

const FILE = `# a page of a notebook
let A = theta(z)^2 / eta^6
let unused = E_6
claim "A is the weak generator": A == phi_{-2,1}
claim "phi_{10,1} is a cusp form": phi_{10,1} is jacobi(weight 10, index 1) cusp
claim "a wrong constant" expect refuted: Delta * phi_{-2,1} == (E_6 * E_{4,1} - E_4 * E_{6,1}) / 143
`;

function certificates(): Certificate[] {
  return checkText(FILE, { evidence: true }, 'page.claim')
    .map((v) => certificateOf(v, '9.9.9'))
    .filter((c): c is Certificate => c !== null);
}

function identity(): Certificate {
  return certificates()[0]!;
}

/** A deep copy with one change, as a hand-edited file would be. */
function edited(c: Certificate, edit: (o: Record<string, any>) => void): Certificate {
  const copy = JSON.parse(JSON.stringify(c)) as Record<string, any>;
  edit(copy);
  return copy as Certificate;
}

function rechecked(c: Certificate) {
  return recheck(c, DEFAULT_CHECK_OPTIONS, '9.9.9');
}

describe('recheck', () => {
  it('only proved claims get a certificate', () => {
    expect(certificates().map((c) => c.claim.name)).toEqual(['A is the weak generator', 'phi_{10,1} is a cusp form']);
  });

  it('confirms untouched certificates, with and without a coefficient comparison', () => {
    for (const c of certificates()) expect(rechecked(c)).toEqual({ status: 'confirmed', certificate: c });
  });

  it('stands alone: the closure holds the definition, not the unused one', () => {
    expect(identity().closure.text).toBe('let A = theta(z)^2 / eta^6');
  });

  it('rejects a lowered bound', () => {
    const r = rechecked(edited(identity(), (o) => (o['bound']['qOrder'] = '-1')));
    expect(r).toMatchObject({ status: 'disagrees', step: 'bound' });
    if (r.status === 'disagrees') expect(r.detail).toBe('bound.qOrder: the certificate says "-1", re-derived "0"');
  });

  it('rejects a changed weight in the derivation parameters', () => {
    expect(rechecked(edited(identity(), (o) => (o['bound']['weight'] = '-4')))).toMatchObject({ status: 'disagrees', step: 'bound' });
  });

  it('rejects a changed digest', () => {
    const r = rechecked(edited(identity(), (o) => (o['comparison']['digest']['value'] = '0'.repeat(64))));
    expect(r).toMatchObject({ status: 'disagrees', step: 'digest' });
  });

  it('rejects a cut coefficient count', () => {
    expect(rechecked(edited(identity(), (o) => (o['comparison']['coefficients'] = 2)))).toMatchObject({ status: 'disagrees', step: 'coefficient count' });
  });

  it('rejects claim text edited without the hash', () => {
    const r = rechecked(edited(identity(), (o) => (o['claim']['text'] = 'claim "A is the weak generator": A == 2 * phi_{-2,1}')));
    expect(r).toMatchObject({ status: 'disagrees', step: 'claim hash' });
  });

  it('rejects claim text edited with a matching hash: the re-derivation refutes it', () => {
    const text = 'claim "A is the weak generator": A == 2 * phi_{-2,1}';
    const r = rechecked(edited(identity(), (o) => Object.assign(o['claim'], { text, sha256: sha256Hex(text) })));
    expect(r).toMatchObject({ status: 'disagrees', step: 'verdict' });
  });

  it('rejects an edited closure', () => {
    expect(rechecked(edited(identity(), (o) => (o['closure']['text'] = 'let A = theta(z)^2 / eta^5')))).toMatchObject({ status: 'disagrees', step: 'closure hash' });
  });

  it('rejects a changed factor type in the normal form', () => {
    const r = rechecked(edited(identity(), (o) => (o['normalForm']['left']['factors'][0]['type']['weight'] = '1')));
    expect(r).toMatchObject({ status: 'disagrees', step: 'normal form' });
  });

  it('rejects a claimed type that is not the claim\'s', () => {
    expect(rechecked(edited(identity(), (o) => (o['type']['index'] = '2')))).toMatchObject({ status: 'disagrees', step: 'type' });
  });

  it('rejects a claim text holding a second claim', () => {
    const text = 'claim "A is the weak generator": A == phi_{-2,1}\nclaim "more": E_4 == E_6';
    const r = rechecked(edited(identity(), (o) => Object.assign(o['claim'], { text, sha256: sha256Hex(text) })));
    expect(r).toMatchObject({ status: 'disagrees', step: 'parse' });
  });

  it('calls a file unusable when it is not JSON or not a certificate', () => {
    const opts = DEFAULT_CHECK_OPTIONS;
    expect(recheckText('{ not json', opts, '1').status).toBe('unusable');
    expect(recheckText('[]', opts, '1').status).toBe('unusable');
    const noRoute = JSON.stringify(edited(identity(), (o) => delete o['route']));
    expect(recheckText(noRoute, opts, '1')).toMatchObject({ status: 'unusable', problem: expect.stringContaining('missing "route"') });
    const future = JSON.stringify(edited(identity(), (o) => (o['formatVersion'] = 2)));
    expect(recheckText(future, opts, '1').status).toBe('unusable');
    const modular = JSON.stringify(edited(identity(), (o) => (o['route'] = { route: 'modular' })));
    expect(recheckText(modular, opts, '1').status).toBe('unusable');
  });
});
