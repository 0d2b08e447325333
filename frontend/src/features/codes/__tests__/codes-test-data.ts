import { parseDtc, type CodeEntryDto, type CodeIndexEntry, type DtcStructure } from '@causeway/shared';

/** Invented test data: catalogue rows shaped like the server's, not repair information. */
export function structureOf(code: string): DtcStructure {
  const parsed = parseDtc(code);
  if (!parsed.ok) throw new Error(parsed.error.message);
  return parsed.value;
}

export const CODE_INDEX: CodeIndexEntry[] = [
  { code: 'P0171', make: null, title: 'System Too Lean (Bank 1)', subsystem: 'Fuel and air metering', system: 'P', control: 'sae', symptoms: 'Engine warning lamp on; Hesitation' },
  { code: 'P0300', make: null, title: 'Random/Multiple Cylinder Misfire Detected', subsystem: 'Ignition system or misfire', system: 'P', control: 'sae', symptoms: 'Rough running; Flashing lamp' },
  { code: 'P0442', make: null, title: 'Evaporative Emission System Leak Detected (small leak)', subsystem: 'Evaporative emission (EVAP)', system: 'P', control: 'sae', symptoms: 'Engine warning lamp on' },
  { code: 'P0455', make: null, title: 'Evaporative Emission System Leak Detected (large leak)', subsystem: 'Evaporative emission (EVAP)', system: 'P', control: 'sae', symptoms: 'Fuel smell' },
  { code: 'P0456', make: null, title: 'Evaporative Emission System Leak Detected (very small leak)', subsystem: 'Evaporative emission (EVAP)', system: 'P', control: 'sae', symptoms: 'Engine warning lamp on; Usually nothing else' },
  { code: 'U0100', make: null, title: 'Lost Communication With ECM/PCM "A"', subsystem: 'Network communication', system: 'U', control: 'sae', symptoms: 'Several warning lamps' },
];

export function makeCodeEntry(overrides: Partial<CodeEntryDto> = {}): CodeEntryDto {
  return {
    code: 'P0456',
    make: null,
    title: 'Evaporative Emission System Leak Detected (very small leak)',
    subsystem: 'Evaporative emission (EVAP)',
    system: 'P',
    control: 'sae',
    description: 'The leak test found the sealed vapour system losing pressure slightly faster than it should.',
    symptoms: ['Engine warning lamp on'],
    verification: { monitor: 'EVAP monitor', procedure: 'Clear codes, let the vehicle stand overnight, then drive.', hours: 0.5 },
    escalation: { hours: 2, description: 'Smoke test of the whole system.' },
    cautions: [
      {
        key: 'fuel-vapour',
        title: 'Fuel and fuel vapour',
        points: ['Keep every ignition source away.', "Follow the vehicle maker's procedure, local regulations and licensed practice: they govern this work."],
        sources: ['Test source'],
      },
    ],
    structure: structureOf('P0456'),
    source: 'causeway',
    otherMakes: [],
    ...overrides,
  };
}
