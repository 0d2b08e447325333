import type { DtcStructure } from '@causeway/shared';

/**
 * The cautions a code carries when its catalogue entry names none, from the system its
 * range belongs to (SAE J2012 groups, domain-reference §1; hazards per §7, common practice).
 * Ranges named here from memory; a catalogue entry's own list always wins.
 */
export function defaultCautionsFor(s: Pick<DtcStructure, 'code' | 'system'>): string[] {
  const c = s.code;
  const out: string[] = [];
  if (s.system === 'P') {
    const third = c[2];
    if (c[1] === '0' && ['A', 'B', 'C', 'D', 'E'].includes(third)) out.push('hybrid-high-voltage');
    if (c[1] === '2' && ['B', 'C', 'D', 'E'].includes(third)) out.push('hybrid-high-voltage');
    if ((c[1] === '0' && third === '3') || (c[1] === '2' && third === '3')) out.push('ignition-high-voltage');
    if (/^P04[4-5]/.test(c) || /^P24[0-5]/.test(c) || /^P0[0-2]/.test(c) || /^P2[0-2]/.test(c)) out.push('fuel-vapour');
    if (/^P0(08[7-9]|19[0-3])/.test(c)) out.push('stored-pressure');
    if (/^P04[2-3]/.test(c)) out.push('lifted-vehicle');
  } else if (s.system === 'B') {
    // B00xx: restraint (airbag / pretensioner) deployment loops (from memory).
    if (c[1] === '0' && c[2] === '0') out.push('airbag-srs');
  } else if (s.system === 'C') {
    out.push('brakes', 'lifted-vehicle');
  }
  return [...new Set(out)];
}
