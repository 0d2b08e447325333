import { DeleteOutlined, FilePdfOutlined, FileImageOutlined, InboxOutlined } from '@ant-design/icons';
import { ATTACHMENT_LIMITS, type AttachmentDto, type FieldError } from '@causeway/shared';
import { Alert, Button, List, Typography, Upload, type UploadFile } from 'antd';
import { useState } from 'react';
import { FormSection } from './form-section';

const MB = ATTACHMENT_LIMITS.maxBytes / (1024 * 1024);
const ACCEPT = '.jpg,.jpeg,.png,.webp,.pdf,image/jpeg,image/png,image/webp,application/pdf';

function size(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${(bytes / (1024 * 1024)).toFixed(1)} MB` : `${Math.max(1, Math.round(bytes / 1024))} KB`;
}

type EvidenceUploadProps = {
  /** Files already stored with the report. */
  attachments: AttachmentDto[];
  /** Chosen, not yet uploaded; they go up when the report is saved. */
  pending: UploadFile[];
  onPendingChange: (files: UploadFile[]) => void;
  /** Remove a stored file (drafts only). */
  onRemoveAttachment?: (attachment: AttachmentDto) => void;
  removingId?: string;
  /** What the server refused, file by file. */
  rejections: FieldError[];
};

/**
 * Photos (JPEG, PNG, WebP) and PDF invoices. The limits are checked here as a courtesy; the
 * server decides the type by the content and answers for every file it refuses.
 */
export function EvidenceUpload({ attachments, pending, onPendingChange, onRemoveAttachment, removingId, rejections }: EvidenceUploadProps) {
  const [local, setLocal] = useState<string[]>([]);
  const room = ATTACHMENT_LIMITS.maxFiles - attachments.length;
  return (
    <FormSection title="Evidence">
      <Typography.Paragraph type="secondary">
        Photos (JPEG, PNG or WebP) and PDF invoices, up to {ATTACHMENT_LIMITS.maxFiles} files of at most {MB} MB each. Location and camera details are removed
        from photos when they are stored.
      </Typography.Paragraph>
      {rejections.length > 0 && (
        <Alert
          type="error"
          showIcon
          role="alert"
          title="These files were not uploaded; the report is kept as a draft"
          description={
            <ul style={{ margin: 0, paddingLeft: 20 }}>
              {rejections.map((r, i) => (
                <li key={i}>{r.message}</li>
              ))}
            </ul>
          }
          style={{ marginBottom: 16 }}
        />
      )}
      {local.length > 0 && (
        <Alert
          type="error"
          showIcon
          title="Not added"
          description={
            <ul style={{ margin: 0, paddingLeft: 20 }}>
              {local.map((m, i) => (
                <li key={i}>{m}</li>
              ))}
            </ul>
          }
          closable={{ onClose: () => setLocal([]) }}
          style={{ marginBottom: 16 }}
        />
      )}
      {attachments.length > 0 && (
        <List
          aria-label="Stored files"
          dataSource={attachments}
          style={{ marginBottom: 16, maxWidth: 640 }}
          renderItem={(a) => (
            <List.Item
              actions={
                onRemoveAttachment
                  ? [
                      <Button key="remove" type="text" danger icon={<DeleteOutlined aria-hidden />} loading={removingId === a.id} onClick={() => onRemoveAttachment(a)} aria-label={`Remove ${a.name}`}>
                        Remove
                      </Button>,
                    ]
                  : []
              }
            >
              <List.Item.Meta
                avatar={a.contentType === 'application/pdf' ? <FilePdfOutlined aria-hidden style={{ fontSize: 24 }} /> : <FileImageOutlined aria-hidden style={{ fontSize: 24 }} />}
                title={a.name}
                description={`${a.contentType === 'application/pdf' ? 'PDF' : 'Photo'}, ${size(a.size)}${a.width && a.height ? `, ${a.width}×${a.height}` : ''}`}
              />
            </List.Item>
          )}
        />
      )}
      <Upload.Dragger
        multiple
        accept={ACCEPT}
        fileList={pending}
        disabled={room <= 0}
        beforeUpload={(file, batch) => {
          const problems: string[] = [];
          if (file.size > ATTACHMENT_LIMITS.maxBytes) problems.push(`${file.name}: larger than ${MB} MB.`);
          const index = batch.indexOf(file);
          if (pending.length + index + 1 > room) problems.push(`${file.name}: a report holds at most ${ATTACHMENT_LIMITS.maxFiles} files.`);
          if (problems.length) {
            setLocal((prev) => [...prev, ...problems]);
            return Upload.LIST_IGNORE;
          }
          return false;
        }}
        onChange={({ fileList }) => onPendingChange(fileList.map((f) => ({ ...f, status: 'done' as const })))}
        style={{ maxWidth: 640 }}
      >
        <p className="ant-upload-drag-icon">
          <InboxOutlined aria-hidden />
        </p>
        <p className="ant-upload-text">{room > 0 ? 'Add photos or invoices: click or drop files here' : 'This report holds the most files it can'}</p>
        <p className="ant-upload-hint">They are uploaded when you save or submit the report.</p>
      </Upload.Dragger>
    </FormSection>
  );
}
