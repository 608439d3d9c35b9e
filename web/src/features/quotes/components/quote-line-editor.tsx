import { Button, Flex, Grid, Popconfirm, Space, Table, Tag } from 'antd';
import { useState, type HTMLAttributes, type ReactNode } from 'react';
import { FormErrorAlert } from '@/components/form-error-alert';
import { useUpdateQuote } from '../api/update-quote';
import { formToInput, lineToInput, type QuoteLineFormValues } from '../quote-line-input';
import type { Quote, QuoteLine } from '../types';
import { QuoteLineDrawer } from './quote-line-drawer';
import { QuoteLineCards } from './quote-line-cards';
import { quoteLineColumns } from './quote-lines';
import { QuoteTotals } from './quote-totals';

export interface QuoteLineEditorProps {
  /** The quote with its working (unsent) revision. */
  quote: Quote;
  /** The markup a new cost-priced line starts with. */
  defaultMarkupPercent?: number;
  /** More buttons beside "Add parts line" and "Add labor line". */
  actions?: ReactNode;
  /**
   * The page's one change of this quote, shared with its other forms, so a later success anywhere clears an
   * earlier refusal; the editor keeps its own when none is given.
   */
  update?: ReturnType<typeof useUpdateQuote>;
  /** Another form of the page is open and shows the refusal itself. */
  otherFormOpen?: boolean;
}

type Editing = { kind: QuoteLine['kind']; line?: QuoteLine } | null;

const KIND_TAG: Record<QuoteLine['kind'], { color: string; label: string }> = {
  part: { color: 'blue', label: 'Part' },
  labor: { color: 'purple', label: 'Labor' },
};

/**
 * The lines of the working revision, editable: add, change or remove a line. Each save sends the whole list
 * (every kept line with its key) and shows the figures the API priced.
 */
export function QuoteLineEditor({ quote, defaultMarkupPercent, actions, update: shared, otherFormOpen = false }: QuoteLineEditorProps) {
  const [editing, setEditing] = useState<Editing>(null);
  const own = useUpdateQuote(quote.id);
  const update = shared ?? own;
  const lines = quote.revision.lines;

  const save = (values: QuoteLineFormValues) => {
    if (!editing) return;
    const changed = formToInput(editing.kind, values, editing.line);
    const next = editing.line ? lines.map((line) => (line.key === editing.line!.key ? changed : lineToInput(line))) : [...lines.map(lineToInput), changed];
    update.mutate({ lines: next }, { onSuccess: () => setEditing(null) });
  };
  const remove = (key: string) => update.mutate({ lines: lines.filter((line) => line.key !== key).map(lineToInput) });
  // A refusal belongs to the form that was sent: opening or closing a form starts clean.
  const open = (next: Editing) => {
    update.reset();
    setEditing(next);
  };
  const close = () => {
    update.reset();
    setEditing(null);
  };
  // Below antd's md (768 px) the lines stack with their commands, so nothing hides past the right edge of a phone.
  const narrow = Grid.useBreakpoint().md === false;
  const currency = quote.revision.currency;
  const kindTag = (line: QuoteLine) => <Tag color={KIND_TAG[line.kind].color}>{KIND_TAG[line.kind].label}</Tag>;
  const lineActions = (line: QuoteLine) => (
    <Space size={4}>
      <Button size="small" type="link" onClick={() => open({ kind: line.kind, line })} aria-label={`Edit ${line.description}`}>
        Edit
      </Button>
      <Popconfirm title="Remove this line from the quote?" okText="Remove" okButtonProps={{ danger: true }} onConfirm={() => remove(line.key)}>
        <Button size="small" type="link" danger aria-label={`Remove ${line.description}`}>
          Remove
        </Button>
      </Popconfirm>
    </Space>
  );

  return (
    <>
      <Flex gap={8} wrap style={{ marginBottom: 12 }}>
        <Button onClick={() => open({ kind: 'part' })}>Add parts line</Button>
        <Button onClick={() => open({ kind: 'labor' })}>Add labor line</Button>
        {actions}
      </Flex>
      {!editing && !otherFormOpen && <FormErrorAlert error={update.error} />}
      {narrow ? (
        <QuoteLineCards lines={lines} currency={currency} lead={kindTag} actions={lineActions} />
      ) : (
        <Table<QuoteLine>
          size="small"
          rowKey="key"
          pagination={false}
          scroll={{ x: 720 }}
          dataSource={lines}
          loading={update.isPending && !editing}
          onRow={(line) => ({ 'data-testid': `quote-line-${line.key}` }) as HTMLAttributes<HTMLElement>}
          columns={[
            { title: 'Kind', key: 'kind', render: (_, line) => kindTag(line) },
            ...quoteLineColumns(currency),
            { title: '', key: 'actions', align: 'right', render: (_, line) => lineActions(line) },
          ]}
        />
      )}
      <QuoteTotals quote={quote} />
      <QuoteLineDrawer
        open={editing !== null}
        kind={editing?.kind ?? 'part'}
        line={editing?.line}
        currency={currency}
        defaultMarkupPercent={defaultMarkupPercent}
        saving={update.isPending}
        error={update.error}
        onSubmit={save}
        onClose={close}
      />
    </>
  );
}
