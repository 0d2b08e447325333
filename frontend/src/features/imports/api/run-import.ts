import type { ImportMappingInput, ImportReport } from '@causeway/shared';
import { xhrUpload, type UploadProgress } from '../utils/xhr-upload';

export interface RunImportInput {
  file: File;
  /** true: check, preview and rehearse only; false: commit. */
  dryRun: boolean;
  /** Import the valid rows and skip the rejected ones (otherwise a file with a bad row is refused whole). */
  validOnly?: boolean;
  /** Applied over the detected mapping. */
  mapping?: ImportMappingInput;
  /** A client-chosen id, so the commit's progress can be read while it runs. */
  id?: string;
  onProgress?: (progress: UploadProgress) => void;
  signal?: AbortSignal;
}

/** `POST /api/imports?dryRun=&validOnly=&id=` (multipart `file`, `mapping` as JSON). */
export function runImport({ file, dryRun, validOnly = false, mapping, id, onProgress, signal }: RunImportInput): Promise<ImportReport> {
  const form = new FormData();
  form.append('file', file, file.name);
  if (mapping) form.append('mapping', JSON.stringify(mapping));
  return xhrUpload<ImportReport>('/imports', form, { params: { dryRun, validOnly, id }, onProgress, signal });
}
