import { FIELD_REPORT_KINDS, type AttachmentDto, type DistanceUnit, type FieldError, type FieldReportDto, type FieldReportKind } from '@causeway/shared';
import { useQueryClient } from '@tanstack/react-query';
import { Alert, App, Button, Card, Flex, Form, Popconfirm, Radio, Typography, type UploadFile } from 'antd';
import { useState } from 'react';
import { isApiError } from '@/lib/api-client';
import { applyFieldErrors, formAlertMessage } from '@/lib/form-errors';
import { KIND_LABELS } from '@/utils/field-report-labels';
import { createReport } from '../api/create-report';
import { useDeleteAttachment } from '../api/delete-attachment';
import { getCodeCausesQueryOptions } from '../api/get-code-causes';
import { FIELD_REPORTS_QUERY_KEY } from '../api/get-my-reports';
import { submitReport } from '../api/submit-report';
import { updateReport } from '../api/update-report';
import { uploadAttachments } from '../api/upload-attachments';
import { useWithdrawReport } from '../api/withdraw-report';
import { KIND_HINTS } from '../utils/labels';
import { emptyFormValues, inFormTerms, normalisedCode, reportFieldErrorOptions, toFormValues, toRequest, type FormContext, type ReportFormValues } from '../utils/report-form';
import { CodeField } from './code-field';
import { ConfirmedFixFields } from './confirmed-fix-fields';
import { CorrectionFields } from './correction-fields';
import { EvidenceUpload } from './evidence-upload';
import { NewCauseFields } from './new-cause-fields';

export type SavedHow = 'draft' | 'submitted' | 'withdrawn';

type ReportFormProps = {
  /** The draft being edited; absent for a new report. */
  report?: FieldReportDto;
  initialKind?: FieldReportKind;
  distanceUnit: DistanceUnit;
  currency: string;
  locale: string;
  /** After a save: the report as the server has it, what happened, and any files the server refused. */
  onSaved: (report: FieldReportDto, how: SavedHow, rejections?: FieldError[]) => void;
  /** Files refused when the draft was first saved (carried over from the new-report page). */
  initialRejections?: FieldError[];
};

export function ReportForm({ report, initialKind = 'confirmed-fix', distanceUnit, currency, locale, onSaved, initialRejections = [] }: ReportFormProps) {
  const { message } = App.useApp();
  const queryClient = useQueryClient();
  const [form] = Form.useForm<ReportFormValues>();
  const ctx: FormContext = { distanceUnit, currency };
  const [initialValues] = useState<ReportFormValues>(() => (report ? toFormValues(report, ctx) : emptyFormValues(initialKind, ctx)));
  const kind = Form.useWatch<FieldReportKind | undefined>('kind', form) ?? initialValues.kind;
  const [alert, setAlert] = useState<string | null>(null);
  const [pending, setPending] = useState<UploadFile[]>([]);
  const [rejections, setRejections] = useState<FieldError[]>(initialRejections);
  const [busy, setBusy] = useState<'draft' | 'submit' | null>(null);
  const removeAttachment = useDeleteAttachment({ mutationConfig: { onError: (e) => void message.error(e.message) } });
  const withdraw = useWithdrawReport({
    mutationConfig: { onSuccess: (saved) => onSaved(saved, 'withdrawn'), onError: (e) => setAlert(e.message) },
  });
  const attachments: AttachmentDto[] = report?.attachments ?? [];

  async function save(submit: boolean) {
    let values: ReportFormValues;
    try {
      values = await form.validateFields();
    } catch {
      return;
    }
    setAlert(null);
    setRejections([]);
    setBusy(submit ? 'submit' : 'draft');
    const code = normalisedCode(values.code);
    const causes = values.kind === 'correction' ? await queryClient.fetchQuery(getCodeCausesQueryOptions(code)).catch(() => []) : [];
    const request = toRequest(values, ctx, causes);
    const files = pending.map((f) => f.originFileObj).filter((f): f is NonNullable<typeof f> => !!f);
    // With files to add, the report is saved as a draft first: files can only be added to a draft.
    const submitWithSave = submit && files.length === 0;
    let saved: FieldReportDto;
    try {
      saved = report ? await updateReport({ id: report.id, body: { ...request, submit: submitWithSave } }) : await createReport({ ...request, submit: submitWithSave });
    } catch (error) {
      const shown = inFormTerms(error);
      setAlert(formAlertMessage(shown, applyFieldErrors(form, shown, reportFieldErrorOptions(values))));
      setBusy(null);
      return;
    }
    try {
      if (files.length > 0) {
        try {
          await uploadAttachments({ reportId: saved.id, files });
          setPending([]);
        } catch (error) {
          const refused: FieldError[] =
            isApiError(error) && error.fieldErrors.length > 0 ? error.fieldErrors : [{ field: 'files', message: error instanceof Error ? error.message : 'The files could not be uploaded.' }];
          void queryClient.invalidateQueries({ queryKey: FIELD_REPORTS_QUERY_KEY });
          if (report) setRejections(refused);
          else onSaved(saved, 'draft', refused);
          return;
        }
        if (submit) saved = await submitReport(saved.id);
      }
      await queryClient.invalidateQueries({ queryKey: FIELD_REPORTS_QUERY_KEY });
      onSaved(saved, submit ? 'submitted' : 'draft');
    } catch (error) {
      setAlert(error instanceof Error ? error.message : 'Something went wrong. Try again.');
    } finally {
      setBusy(null);
    }
  }

  return (
    <Form<ReportFormValues> form={form} layout="vertical" requiredMark={false} initialValues={initialValues} onFinish={() => void save(true)} scrollToFirstError>
      <Card style={{ marginBottom: 24 }}>
        <Form.Item name="kind" label="What are you reporting?" extra={KIND_HINTS[kind]}>
          <Radio.Group optionType="button" buttonStyle="solid" size="large" options={FIELD_REPORT_KINDS.map((k) => ({ value: k, label: KIND_LABELS[k] }))} />
        </Form.Item>
        <CodeField />
      </Card>
      <Card style={{ marginBottom: 24 }}>
        {alert && <Alert type="error" showIcon title={alert} style={{ marginBottom: 24 }} />}
        {kind === 'confirmed-fix' && <ConfirmedFixFields distanceUnit={distanceUnit} />}
        {kind === 'new-cause' && <NewCauseFields />}
        {kind === 'correction' && <CorrectionFields locale={locale} />}
        <EvidenceUpload
          attachments={attachments}
          pending={pending}
          onPendingChange={setPending}
          rejections={rejections}
          removingId={removeAttachment.isPending ? removeAttachment.variables?.attachmentId : undefined}
          onRemoveAttachment={report ? (a) => removeAttachment.mutate({ reportId: report.id, attachmentId: a.id }) : undefined}
        />
      </Card>
      <Flex gap={12} wrap>
        <Button type="primary" size="large" htmlType="submit" loading={busy === 'submit'} disabled={busy === 'draft'}>
          Submit for review
        </Button>
        <Button size="large" onClick={() => void save(false)} loading={busy === 'draft'} disabled={busy === 'submit'}>
          Save draft
        </Button>
        {report && (
          <Popconfirm title="Withdraw this report?" description="A withdrawn report cannot be submitted again." okText="Withdraw" cancelText="Keep it" onConfirm={() => withdraw.mutate(report.id)}>
            <Button size="large" danger loading={withdraw.isPending}>
              Withdraw
            </Button>
          </Popconfirm>
        )}
      </Flex>
      <Typography.Paragraph type="secondary" style={{ marginTop: 12 }}>
        A moderator reviews every report on the review desk; you are e-mailed when it is decided.
      </Typography.Paragraph>
    </Form>
  );
}
