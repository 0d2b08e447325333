/**
 * Failure-type byte (FTB) of a three-byte UDS fault code: the high nibble is the category,
 * the low nibble the sub-type within it (ISO 14229-1 Annex D / SAE J2012-DA).
 */

import { showValue } from './show-value';

export interface FailureTypeInfo {
  byte: number;
  /** Two upper-case hex digits, e.g. '13'. */
  hex: string;
  category: string;
  /** Sub-type wording where the value is one of the commonly used ones; null otherwise. */
  description: string | null;
}

// Categories 0xA–0xE are gaps in the standard; 0xF is left to manufacturers.
const CATEGORIES: readonly string[] = [
  'No sub-type information',
  'General electrical failure',
  'General signal failure',
  'Frequency-modulated / pulse-width-modulated signal failure',
  'System internal failure',
  'System programming failure',
  'Algorithm-based failure',
  'Mechanical failure',
  'Bus signal / message failure',
  'Component failure',
  'Reserved',
  'Reserved',
  'Reserved',
  'Reserved',
  'Reserved',
  'Manufacturer-specific',
];

const DESCRIPTIONS: Readonly<Record<number, string>> = {
  0x00: 'No sub-type information',
  0x11: 'Circuit short to ground',
  0x12: 'Circuit short to battery',
  0x13: 'Circuit open',
  0x14: 'Circuit short to ground or open',
  0x15: 'Circuit short to battery or open',
  0x16: 'Circuit voltage below threshold',
  0x17: 'Circuit voltage above threshold',
  0x18: 'Circuit current below threshold',
  0x19: 'Circuit current above threshold',
  0x1a: 'Circuit resistance below threshold',
  0x1b: 'Circuit resistance above threshold',
  0x1c: 'Circuit voltage out of range',
  0x1d: 'Circuit current out of range',
  0x1f: 'Circuit intermittent',
  0x21: 'Signal amplitude below minimum',
  0x22: 'Signal amplitude above maximum',
  0x23: 'Signal stuck low',
  0x24: 'Signal stuck high',
  0x26: 'Signal rate of change below threshold',
  0x27: 'Signal rate of change above threshold',
  0x28: 'Signal bias level / zero adjustment failure',
  0x29: 'Signal invalid',
  0x2f: 'Signal erratic',
  0x31: 'No signal',
  0x36: 'Signal frequency too low',
  0x37: 'Signal frequency too high',
  0x38: 'Signal frequency incorrect',
  0x41: 'Checksum failure',
  0x42: 'Memory failure',
  0x47: 'Watchdog / safety controller failure',
  0x49: 'Internal electronic failure',
  0x4a: 'Incorrect component installed',
  0x4b: 'Over temperature',
  0x51: 'Not programmed',
  0x54: 'Missing calibration',
  0x55: 'Not configured',
  0x62: 'Signal compare failure',
  0x64: 'Signal plausibility failure',
  0x71: 'Actuator stuck',
  0x72: 'Actuator stuck open',
  0x73: 'Actuator stuck closed',
  0x77: 'Commanded position not reachable',
  0x7a: 'Fluid leak or seal failure',
  0x7b: 'Fluid level low',
  0x81: 'Invalid serial data received',
  0x82: 'Alive / sequence counter incorrect or not updated',
  0x86: 'Signal invalid',
  0x87: 'Missing message',
  0x88: 'Bus off',
  0x92: 'Performance or incorrect operation',
  0x96: 'Component internal failure',
  0x98: 'Component or system over temperature',
};

export function isByte(value: unknown): value is number {
  return typeof value === 'number' && Number.isInteger(value) && value >= 0 && value <= 0xff;
}

export function byteHex(byte: number): string {
  return byte.toString(16).toUpperCase().padStart(2, '0');
}

/** Describes a failure-type byte; throws RangeError unless `byte` is an integer 0–255. */
export function describeFailureType(byte: number): FailureTypeInfo {
  if (!isByte(byte)) {
    throw new RangeError(`failure-type byte: expected an integer 0–255, got ${showValue(byte)}`);
  }
  return {
    byte,
    hex: byteHex(byte),
    category: CATEGORIES[byte >> 4],
    description: DESCRIPTIONS[byte] ?? null,
  };
}
