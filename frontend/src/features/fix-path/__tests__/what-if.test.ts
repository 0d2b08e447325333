import { describe, expect, it } from 'vitest';
import { hasEdits, NO_EDITS, whatIfInput } from '../utils/what-if';
import { parseVehicleParams, vehicleOptions, withVehicleParams } from '../utils/vehicle';
import { CAUSE_ROWS, INPUT, INPUT_AT_50, makeFixPath } from './fix-path-test-data';

describe('What-if input', () => {
  it("with nothing edited is the server's input exactly", () => {
    expect(hasEdits(NO_EDITS)).toBe(false);
    expect(whatIfInput(makeFixPath(), NO_EDITS)).toEqual(INPUT);
  });

  it('costs every labour figure again at an edited rate', () => {
    expect(whatIfInput(makeFixPath(), { labourRateMinor: 5_000, causes: {} })).toEqual(INPUT_AT_50);
  });

  it("changes only the edited cause's replacement cost", () => {
    const input = whatIfInput(makeFixPath(), { causes: { 'fuel-cap': { partCostMinor: 1_000, replaceHours: 0.5 } } });
    expect(input.causes.map((c) => c.replaceCost)).toEqual([6_750, 1_000 + 4_750, 7_650]);
    expect(input.teardowns).toEqual(INPUT.teardowns);
  });
});

describe('Vehicle choice', () => {
  it('reads and writes the address, dropping a model without a make', () => {
    expect(parseVehicleParams(new URLSearchParams('make=Halden&model=Tarn&engine=1.6+T&year=2019'))).toEqual({ make: 'Halden', model: 'Tarn', engine: '1.6 T', year: 2019 });
    expect(parseVehicleParams(new URLSearchParams('model=Tarn&year=nope'))).toEqual({});
    expect(withVehicleParams(new URLSearchParams('tab=x&make=Morrow'), { make: 'Halden', model: 'Tarn' }).toString()).toBe('tab=x&make=Halden&model=Tarn');
  });

  it('offers the makes, models and engines the knowledge base names', () => {
    expect(vehicleOptions(CAUSE_ROWS)).toEqual([
      {
        make: 'Halden',
        models: [
          { model: 'Tarn', engines: ['1.6 T'], yearFrom: 2015, yearTo: null },
          { model: 'Vey', engines: ['2.0 hybrid'], yearFrom: 2018, yearTo: null },
        ],
      },
      { make: 'Morrow', models: [{ model: 'Strand', engines: ['3.0 V6'], yearFrom: 2014, yearTo: null }] },
    ]);
  });
});
