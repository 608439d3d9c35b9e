import { Alert, Button, Card, Form, Progress, Select, Space, Table, Typography, Upload } from 'antd';
import { PART_CATEGORIES, PART_CATEGORY_LABELS } from '@swapwright/shared';
import Papa from 'papaparse';
import { useState } from 'react';
import { saveBlob } from '@/lib/download';
import { useImportParts } from '../api/import-parts';
import { type ImportPreview, usePreviewPartsImport } from '../api/preview-parts-import';

const FIELDS = ['sku', 'description', 'category', 'price', 'cost', 'supplier', 'supplierSku', 'laborHours', 'location', 'bin', 'onHand'] as const;
type ImportField = (typeof FIELDS)[number];
const REQUIRED = new Set<string>(['sku', 'description', 'category', 'price']);

/** What the counter calls each field the import reads. */
export const IMPORT_FIELD_LABELS: Record<ImportField, string> = {
  sku: 'SKU (part number)',
  description: 'Description',
  category: 'Category',
  price: 'Price',
  cost: 'Cost',
  supplier: 'Supplier',
  supplierSku: "Supplier's part number",
  laborHours: 'Install hours',
  location: 'Location',
  bin: 'Bin',
  onHand: 'On hand',
};
const fieldLabel = (field: string): string => IMPORT_FIELD_LABELS[field as ImportField] ?? field;

/** A small file in the layout the import reads without any column matching, to start a supplier's sheet from. */
export function sampleImportCsv(): string {
  return Papa.unparse({
    fields: [...FIELDS],
    data: [
      ['PAN-100', 'Rear-sump swap oil pan', 'oil-pan', '279.00', '190.00', 'Your supplier', 'V-PAN-100', '2.5', 'Main store', 'A-01-1', '2'],
      ['FP-200', 'In-tank injection fuel pump', 'fuel-pump', '179.00', '120.00', 'Your supplier', 'V-FP-200', '1.5', 'Main store', 'D-01-1', '1'],
    ],
  });
}

/** The rejected rows as a CSV the clerk can fix and upload again, with the errors in a last column. */
function downloadRejected(preview: ImportPreview): void {
  const fields = [...preview.headers, 'errors'];
  const data = preview.rejected.map((r) => [...preview.headers.map((h) => r.cells[h] ?? ''), r.errors.join('; ')]);
  saveBlob(new Blob([Papa.unparse({ fields, data }, { escapeFormulae: true })], { type: 'text/csv' }), 'rejected-rows.csv');
}

/** Upload a supplier's file, map its columns, see every row's errors, then import it all or nothing. */
export function PartsImport() {
  const [file, setFile] = useState<File | null>(null);
  const [mapping, setMapping] = useState<Record<string, string>>({});
  const [progress, setProgress] = useState(0);
  const preview = usePreviewPartsImport();
  const run = useImportParts();
  const result = preview.data;

  const check = (next: File, nextMapping: Record<string, string>) =>
    preview.mutate({ file: next, mapping: nextMapping, onProgress: setProgress }, { onSuccess: (p) => setMapping(p.mapping) });

  return (
    <Card title="Import a supplier's catalog or price file (CSV)">
      <Space direction="vertical" style={{ width: '100%' }}>
        <Typography.Paragraph style={{ marginBottom: 0 }}>
          One part a line under a header row. Each line needs a SKU (part number), a description, a category and a price; cost,
          supplier, supplier&apos;s part number, install hours, location, bin and on-hand count are read when the file has them. A
          line whose SKU is already in the catalog updates that part. You match the file&apos;s columns next and see every
          line&apos;s problems before anything is stored: the file goes in whole or not at all.
        </Typography.Paragraph>
        <Typography.Paragraph type="secondary" style={{ marginBottom: 0 }} ellipsis={{ rows: 1, expandable: true, symbol: 'every category' }}>
          A category is written by its name, in any case: {PART_CATEGORIES.map((category) => PART_CATEGORY_LABELS[category]).join(', ')}. The short forms of the
          sample file (oil-pan, fuel-pump, …) are read as well.
        </Typography.Paragraph>
        <Button
          type="link"
          style={{ paddingInline: 0, alignSelf: 'flex-start' }}
          onClick={() => saveBlob(new Blob([sampleImportCsv()], { type: 'text/csv' }), 'parts-import-sample.csv')}
        >
          Download a sample file
        </Button>
        <Upload
          accept=".csv,text/csv"
          maxCount={1}
          beforeUpload={(chosen) => {
            setFile(chosen);
            setMapping({});
            run.reset();
            check(chosen, {});
            return false;
          }}
          showUploadList={{ showRemoveIcon: false }}
        >
          <Button>Choose CSV file</Button>
        </Upload>
        {(preview.isPending || run.isPending) && <Progress percent={progress} status="active" aria-label="Upload progress" />}
        {result && file && (
          <>
            <Form layout="inline">
              {FIELDS.map((field) => (
                <Form.Item key={field} label={fieldLabel(field)} required={REQUIRED.has(field)} style={{ marginBottom: 8 }}>
                  <Select
                    aria-label={`Column for ${fieldLabel(field)}`}
                    allowClear
                    style={{ width: 170 }}
                    value={mapping[field]}
                    options={result.headers.map((h) => ({ value: h, label: h }))}
                    onChange={(header?: string) => {
                      const next = { ...mapping };
                      if (header) next[field] = header;
                      else delete next[field];
                      setMapping(next);
                      check(file, next);
                    }}
                  />
                </Form.Item>
              ))}
            </Form>
            {result.unmapped.length > 0 ? (
              <Alert type="info" showIcon title={`Choose the file's columns for: ${result.unmapped.map(fieldLabel).join(', ')}.`} />
            ) : result.errors.length > 0 ? (
              <Alert
                type="error"
                showIcon
                title={`${result.rejected.length} of ${result.rowCount} rows have errors. Nothing is imported until every row is right.`}
                action={<Button onClick={() => downloadRejected(result)}>Download rejected rows</Button>}
              />
            ) : (
              <Alert type="success" showIcon title={`${result.validCount} rows ready to import.`} data-testid="import-ready" />
            )}
            {result.warnings.length > 0 && (
              <Alert type="warning" showIcon title={`${result.warnings.length} cells start like spreadsheet formulas; they are stored as plain text and exported escaped.`} />
            )}
            {result.errors.length > 0 && (
              <Table
                size="small"
                rowKey={(e) => `${e.row}-${e.field}`}
                dataSource={result.errors}
                pagination={{ pageSize: 10 }}
                columns={[
                  { title: 'Line', dataIndex: 'row' },
                  { title: 'Column', dataIndex: 'field', render: (field: string) => fieldLabel(field) },
                  { title: 'Problem', dataIndex: 'message' },
                ]}
              />
            )}
            <Button
              type="primary"
              disabled={result.unmapped.length > 0 || result.errors.length > 0}
              loading={run.isPending}
              onClick={() => run.mutate({ file, mapping, onProgress: setProgress })}
            >
              Import {result.validCount} {result.validCount === 1 ? 'row' : 'rows'}
            </Button>
            {run.data && (
              <Typography.Text data-testid="import-done">
                Imported: {run.data.inserted} new, {run.data.updated} updated.
              </Typography.Text>
            )}
          </>
        )}
      </Space>
    </Card>
  );
}
