import { FilePdfOutlined } from '@ant-design/icons';
import type { AttachmentDto } from '@causeway/shared';
import { App, Button, Flex, Image, Skeleton, Typography } from 'antd';
import { useState } from 'react';
import { getAttachmentFile, useAttachmentObjectUrl } from '../api/get-attachment-file';

function size(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${(bytes / (1024 * 1024)).toFixed(1)} MB` : `${Math.max(1, Math.round(bytes / 1024))} KB`;
}

function Photo({ attachment }: { attachment: AttachmentDto }) {
  const file = useAttachmentObjectUrl(attachment.url);
  return (
    <figure style={{ margin: 0, width: 220 }}>
      {file.status === 'ready' ? (
        <Image src={file.objectUrl} alt={`Photo ${attachment.name}`} width={220} height={165} style={{ objectFit: 'cover', borderRadius: 6 }} />
      ) : file.status === 'error' ? (
        <div role="img" aria-label={`${attachment.name}: ${file.message}`} style={{ width: 220, height: 165, display: 'grid', placeItems: 'center', background: '#eceff0', borderRadius: 6, padding: 12, textAlign: 'center' }}>
          {file.message}
        </div>
      ) : (
        <Skeleton.Image active style={{ width: 220, height: 165 }} />
      )}
      <figcaption>
        <Typography.Text>{attachment.name}</Typography.Text>
        <br />
        <Typography.Text type="secondary">
          {size(attachment.size)}
          {attachment.width && attachment.height ? `, ${attachment.width}×${attachment.height}` : ''}
        </Typography.Text>
      </figcaption>
    </figure>
  );
}

function Invoice({ attachment }: { attachment: AttachmentDto }) {
  const { message } = App.useApp();
  const [busy, setBusy] = useState(false);
  async function download() {
    setBusy(true);
    try {
      const blob = await getAttachmentFile(attachment.url);
      const objectUrl = URL.createObjectURL(blob);
      const link = document.createElement('a');
      link.href = objectUrl;
      link.download = attachment.name;
      link.rel = 'noopener';
      document.body.appendChild(link);
      link.click();
      link.remove();
      setTimeout(() => URL.revokeObjectURL(objectUrl), 10_000);
    } catch (error) {
      void message.error(error instanceof Error ? error.message : 'The file could not be loaded.');
    } finally {
      setBusy(false);
    }
  }
  return (
    <Flex vertical gap={4} style={{ width: 220 }}>
      <Button icon={<FilePdfOutlined aria-hidden />} loading={busy} onClick={() => void download()} style={{ height: 'auto', minHeight: 44, whiteSpace: 'normal' }}>
        Download {attachment.name}
      </Button>
      <Typography.Text type="secondary">PDF, {size(attachment.size)}</Typography.Text>
    </Flex>
  );
}

/** A report's photos and invoices, fetched with the signed-in user's token. */
export function AttachmentGallery({ attachments }: { attachments: AttachmentDto[] }) {
  if (attachments.length === 0) return <Typography.Text type="secondary">No photos or invoices.</Typography.Text>;
  return (
    <Image.PreviewGroup>
      <Flex gap={16} wrap>
        {attachments.map((a) => (a.contentType === 'application/pdf' ? <Invoice key={a.id} attachment={a} /> : <Photo key={a.id} attachment={a} />))}
      </Flex>
    </Image.PreviewGroup>
  );
}
