/** The DTC status byte of UDS service $19 (ISO 14229-1), bit 0 first. */

import { isByte } from './failure-type';
import { showValue } from './show-value';

export interface StatusBit {
  bit: number;
  /** The standard's identifier, e.g. 'confirmedDTC'. */
  name: string;
  label: string;
  set: boolean;
}

export const DTC_STATUS_BITS: readonly { name: string; label: string }[] = [
  { name: 'testFailed', label: 'Test failed' },
  { name: 'testFailedThisOperationCycle', label: 'Test failed this operation cycle' },
  { name: 'pendingDTC', label: 'Pending' },
  { name: 'confirmedDTC', label: 'Confirmed' },
  { name: 'testNotCompletedSinceLastClear', label: 'Test not completed since last clear' },
  { name: 'testFailedSinceLastClear', label: 'Test failed since last clear' },
  { name: 'testNotCompletedThisOperationCycle', label: 'Test not completed this operation cycle' },
  { name: 'warningIndicatorRequested', label: 'Warning indicator requested' },
];

/** All eight bits, b0 to b7, each with whether it is set. Throws RangeError unless 0–255. */
export function decodeStatusByte(status: number): StatusBit[] {
  if (!isByte(status)) {
    throw new RangeError(`status byte: expected an integer 0–255, got ${showValue(status)}`);
  }
  return DTC_STATUS_BITS.map(({ name, label }, bit) => ({
    bit,
    name,
    label,
    set: (status & (1 << bit)) !== 0,
  }));
}

/**
 * Reads a status byte as typed by a person. Always hexadecimal, because scan tools and the
 * standard show status bytes in hex: '2F', '0x2F', '$2F' and '2f' all mean 0x2F, and '47'
 * means 0x47 (71), never decimal 47. One or two digits; returns null for anything else.
 */
export function parseStatusByte(input: string): number | null {
  if (typeof input !== 'string') return null;
  const match = /^(?:0x|\$)?([0-9a-f]{1,2})$/i.exec(input.trim());
  return match ? parseInt(match[1], 16) : null;
}
