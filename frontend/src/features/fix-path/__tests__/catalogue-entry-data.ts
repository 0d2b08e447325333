import { parseDtc, type CodeEntryDto } from '@causeway/shared';

/** Invented test data: the catalogue entry the code page loads before its fix path. */
export function makeCodeEntryForFixPath(): CodeEntryDto {
  const parsed = parseDtc('P0456');
  if (!parsed.ok) throw new Error(parsed.error.message);
  return {
    code: 'P0456',
    make: null,
    title: 'Evaporative Emission System Leak Detected (very small leak)',
    subsystem: 'Evaporative emission (EVAP)',
    system: 'P',
    control: 'sae',
    description: 'The sealed vapour system lost pressure slightly too fast.',
    symptoms: ['Engine warning lamp on'],
    verification: { monitor: 'EVAP monitor', procedure: 'Clear codes, stand overnight, drive.', hours: 0.5 },
    escalation: null,
    cautions: [],
    structure: parsed.value,
    source: 'causeway',
    otherMakes: [],
  };
}
