import type { ImportProgress as Progress } from '@causeway/shared';
import { Progress as Bar, Typography } from 'antd';

type ImportProgressProps = {
  /** 0–100 of the file sent, from the browser. */
  uploaded: number;
  /** The server's progress once the file is there (commits only). */
  server?: Progress | null;
  /** What the server does after the upload, in words. */
  afterUpload: string;
  locale: string;
};

/** One bar: the upload first, then the server reading and writing the rows. */
export function ImportProgress({ uploaded, server, afterUpload, locale }: ImportProgressProps) {
  const uploading = uploaded < 100;
  let percent = uploaded;
  let text = `Uploading the file: ${uploaded} %`;
  if (!uploading) {
    if (server && server.phase === 'reading' && server.bytesTotal > 0) {
      percent = Math.min(99, Math.floor((server.bytesProcessed / server.bytesTotal) * 100));
      text = `Reading and checking the rows: ${new Intl.NumberFormat(locale).format(server.rowsProcessed)} so far (${percent} %)`;
    } else if (server && server.phase === 'writing') {
      percent = 99;
      text = `Writing ${new Intl.NumberFormat(locale).format(server.rowsProcessed)} rows in one transaction…`;
    } else {
      percent = 100;
      text = afterUpload;
    }
  }
  return (
    <div role="status" aria-live="polite" style={{ maxWidth: 640 }}>
      <Bar percent={percent} status="active" aria-label="Import progress" showInfo={false} />
      <Typography.Text>{text}</Typography.Text>
    </div>
  );
}
