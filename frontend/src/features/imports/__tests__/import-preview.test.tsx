import type { ImportReport } from '@causeway/shared';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { ok } from '@/testing/mock-api';
import { makeUser } from '@/testing/test-data';
import { renderApp, TEST_TOKEN } from '@/testing/test-utils';

const technician = makeUser();

const report: ImportReport = {
  importId: null,
  fileName: 'bay-2.csv',
  dryRun: true,
  validOnly: false,
  committed: false,
  refused: true,
  rows: 3,
  accepted: 1,
  rejected: 2,
  skippedDuplicates: 0,
  createdVehicles: 1,
  updatedVehicles: 0,
  createdJobs: 1,
  createdCodes: 1,
  problems: [
    { line: 4, column: 'Scan date', message: 'is not a date: expected 2025-03-14 or 14/03/2025', severity: 'error' },
    { line: 3, column: 'VIN', message: 'check digit is 7, position 9 says 4', severity: 'error' },
  ],
  problemsTotal: 2,
  corrections: [{ line: 2, column: 'DTC', from: 'po456', to: 'P0456' }],
  correctionsTotal: 1,
  preview: [
    {
      line: 2, valid: true, duplicate: false, vin: 'WCWZZZ3C4NP858071', scannedAt: '2025-11-03T09:15:00.000Z', scanDay: '2025-11-03', odometerKm: 84211,
      module: 'ECM', code: 'P0456', status: 'stored', description: 'EVAP small leak', freezeFrame: { RPM: 820 }, make: null, model: null,
    },
  ],
  detected: {
    delimiter: ';',
    encoding: 'utf-8-bom',
    lineEnding: 'crlf',
    headers: ['Scan date', 'VIN', 'DTC'],
    mapping: { columns: { date: 'Scan date', vin: 'VIN', code: 'DTC' }, freezeFrame: [], odometerUnit: null, dateOrder: null, statusValues: {} },
    unmapped: [],
  },
};

/** Stands in for XMLHttpRequest: records the request and answers with `report`. */
class FakeXhr {
  static sent: FakeXhr[] = [];
  method = '';
  url = '';
  headers: Record<string, string> = {};
  body: FormData | null = null;
  status = 0;
  statusText = '';
  responseText = '';
  upload: { onprogress: ((event: { loaded: number; total: number; lengthComputable: boolean }) => void) | null } = { onprogress: null };
  onload: (() => void) | null = null;
  onerror: (() => void) | null = null;
  onabort: (() => void) | null = null;
  open(method: string, url: string) {
    this.method = method;
    this.url = url;
  }
  setRequestHeader(name: string, value: string) {
    this.headers[name] = value;
  }
  send(body: FormData) {
    this.body = body;
    FakeXhr.sent.push(this);
    setTimeout(() => {
      this.upload.onprogress?.({ loaded: 100, total: 100, lengthComputable: true });
      this.status = 200;
      this.responseText = JSON.stringify(report);
      this.onload?.();
    }, 0);
  }
  abort() {
    this.onabort?.();
  }
}

// Warm-up: the first render of a page loads its lazy modules and computes antd's styles, which on a
// busy machine outlasts the page-load wait of renderApp. Done once here, it stays out of the tests.
beforeAll(async () => {
  await renderApp('/imports', { user: technician, api: { 'GET /api/imports': ok({ items: [], total: 0, page: 1, pageSize: 10 }), 'GET /api/imports/mappings': ok([]) } }).catch(() => undefined);
  cleanup();
  window.localStorage.clear();
}, 60_000);

afterEach(() => {
  FakeXhr.sent = [];
});

describe('Scan-tool import', () => {
  it('uploads for a dry run and lists every problem by line and column, with the corrections', async () => {
    vi.stubGlobal('XMLHttpRequest', FakeXhr);
    const app = await renderApp('/imports', {
      user: technician,
      api: {
        'GET /api/imports': ok({ items: [], total: 0, page: 1, pageSize: 10 }),
        'GET /api/imports/mappings': ok([]),
      },
    });

    const input = document.querySelector<HTMLInputElement>('input[type=file]');
    expect(input).not.toBeNull();
    await app.user.upload(input!, new File(['\uFEFFScan date;VIN;DTC\r\n'], 'bay-2.csv', { type: 'text/csv' }));
    await app.user.click(screen.getByRole('button', { name: 'Check the file' }));

    const problems = (await screen.findByText('Problems (2)')).closest('.ant-card') as HTMLElement;
    const rows = within(problems).getAllByRole('row').slice(1);
    // Sorted by line; each names its line and column.
    expect(rows.map((r) => within(r).getAllByRole('cell').slice(0, 3).map((c) => c.textContent))).toEqual([
      ['3', 'VIN', 'check digit is 7, position 9 says 4'],
      ['4', 'Scan date', 'is not a date: expected 2025-03-14 or 14/03/2025'],
    ]);
    const corrections = (screen.getByText('Corrections (1)').closest('.ant-card') as HTMLElement);
    expect(within(corrections).getByText('po456')).toBeInTheDocument();
    expect(within(corrections).getByText('P0456')).toBeInTheDocument();
    expect(screen.getByText('Semicolon')).toBeInTheDocument();
    expect(screen.getByText('UTF-8 with byte-order mark')).toBeInTheDocument();

    // A file with bad rows cannot be imported whole; the valid rows can.
    expect(screen.queryByRole('button', { name: 'Import the file' })).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Import the 1 valid row only' })).toBeEnabled();

    // The dry run went up as multipart with the user's token.
    await waitFor(() => expect(FakeXhr.sent).toHaveLength(1));
    const sent = FakeXhr.sent[0];
    expect(sent.method).toBe('POST');
    expect(sent.url).toBe('/api/imports?dryRun=true&validOnly=false');
    expect(sent.headers.Authorization).toBe(`Bearer ${TEST_TOKEN}`);
    expect((sent.body?.get('file') as File).name).toBe('bay-2.csv');
  }, 60_000);
});
