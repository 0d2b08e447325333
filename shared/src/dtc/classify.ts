/**
 * Classification of a five-character fault code by its range: system letter, who controls
 * the range (SAE J2012 / ISO 15031-6), and a default subsystem group from the third character.
 */

export type DtcSystem = 'P' | 'C' | 'B' | 'U';
export type DtcControl = 'sae' | 'manufacturer' | 'reserved';

export interface DtcClassification {
  system: DtcSystem;
  systemName: string;
  control: DtcControl;
  controlLabel: string;
  /**
   * A caveat on the control range, or null. Set for the U3 range, whose later assignment is
   * recalled without a source to confirm it.
   */
  controlNote: string | null;
  /**
   * Default subsystem group named by the third character. Later J2012 editions place new codes
   * wherever there is room, so a code's own subsystem (stored with its definition) wins over this.
   */
  group: string;
}

export const DTC_SYSTEM_NAMES: Readonly<Record<DtcSystem, string>> = {
  P: 'Powertrain',
  C: 'Chassis',
  B: 'Body',
  U: 'Network',
};

export const DTC_CONTROL_LABELS: Readonly<Record<DtcControl, string>> = {
  sae: 'SAE/ISO-defined (generic)',
  manufacturer: 'Manufacturer-controlled',
  reserved: 'Reserved by SAE J2012',
};

const U3_NOTE =
  'Reserved in SAE J2012 (2007); later assigned by ISO/SAE, e.g. U3000 — from memory, not confirmed in a source';

const FUEL_AIR_AUX = 'Fuel and air metering and auxiliary emission controls';
const TRANSMISSION = 'Transmission';
const HYBRID = 'Hybrid propulsion';
const HYBRID_EV_LATER = 'Hybrid/EV propulsion (later J2012 editions)';

// J2012 (2002/2007) third-character groups for P0 and P2, quoted from memory in the design notes.
const P0_GROUPS: Readonly<Record<string, string>> = {
  '0': FUEL_AIR_AUX,
  '1': 'Fuel and air metering',
  '2': 'Fuel and air metering (injector circuit)',
  '3': 'Ignition system or misfire',
  '4': 'Auxiliary emission controls (EGR, catalyst, EVAP)',
  '5': 'Vehicle speed, idle control and auxiliary inputs',
  '6': 'Computer and auxiliary outputs',
  '7': TRANSMISSION,
  '8': TRANSMISSION,
  '9': TRANSMISSION,
  A: HYBRID,
  B: HYBRID,
  C: HYBRID,
  D: HYBRID_EV_LATER,
  E: HYBRID_EV_LATER,
  F: 'Powertrain (unassigned group)',
};

const P2_GROUPS: Readonly<Record<string, string>> = {
  '0': FUEL_AIR_AUX,
  '1': FUEL_AIR_AUX,
  '2': FUEL_AIR_AUX,
  '3': 'Ignition system or misfire',
  '4': 'Auxiliary emission controls',
  '5': 'Auxiliary inputs',
  '6': 'Computer and auxiliary outputs',
  '7': TRANSMISSION,
  '8': 'Transmission (reserved in early editions)',
  '9': FUEL_AIR_AUX,
  A: FUEL_AIR_AUX,
  B: HYBRID_EV_LATER,
  C: HYBRID_EV_LATER,
  D: HYBRID_EV_LATER,
  E: HYBRID_EV_LATER,
  F: 'Powertrain (unassigned group)',
};

const GENERIC_GROUP: Readonly<Record<DtcSystem, string>> = {
  P: 'Powertrain',
  C: 'Chassis',
  B: 'Body',
  U: 'Network communication',
};

/** Range control of a code whose characters are already known to be valid. */
export function controlOf(system: DtcSystem, second: string, third: string): DtcControl {
  switch (second) {
    case '0':
      return 'sae';
    case '1':
      return 'manufacturer';
    case '2':
      return system === 'P' ? 'sae' : 'manufacturer';
    default:
      if (system !== 'P') return 'reserved';
      // P3000–P33FF manufacturer, P3400–P3FFF standard: the split falls on the third character.
      return parseInt(third, 16) <= 3 ? 'manufacturer' : 'sae';
  }
}

function groupOf(system: DtcSystem, control: DtcControl, second: string, third: string): string {
  const generic = GENERIC_GROUP[system];
  if (system === 'P' && second === '0') return P0_GROUPS[third] ?? generic;
  if (system === 'P' && second === '2') return P2_GROUPS[third] ?? generic;
  if (control === 'manufacturer') return `Manufacturer-controlled (${generic.toLowerCase()})`;
  if (control === 'reserved') return `${generic} (reserved range)`;
  if (system === 'P') return 'Powertrain (standard range P3400–P3FFF)';
  return generic;
}

/**
 * Classifies an already-validated, upper-case five-character code. Callers outside this module
 * go through `classifyDtc`, which validates first.
 */
export function classifyValidCode(code: string): DtcClassification {
  const system = code[0] as DtcSystem;
  const second = code[1];
  const third = code[2];
  const control = controlOf(system, second, third);
  const isU3 = system === 'U' && second === '3';
  return {
    system,
    systemName: DTC_SYSTEM_NAMES[system],
    control,
    controlLabel: isU3 ? 'Reserved by SAE J2012 (2007)' : DTC_CONTROL_LABELS[control],
    controlNote: isU3 ? U3_NOTE : null,
    group: groupOf(system, control, second, third),
  };
}
