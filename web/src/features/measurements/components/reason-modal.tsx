import { Input, Modal, Typography } from 'antd';
import { useState } from 'react';
import { reasonProblem } from '../lib/sheet-state';

export type ReasonModalProps = {
  open: boolean;
  pointLabel: string;
  /** The change in words, e.g. "13.98 in → 13.19 in". */
  change: string;
  saving: boolean;
  onCancel: () => void;
  onConfirm: (reason: string) => void;
};

/** After sign-off a changed reading needs a reason; it goes to the sheet's history with the change. */
export function ReasonModal({ open, pointLabel, change, saving, onCancel, onConfirm }: ReasonModalProps) {
  const [reason, setReason] = useState('');
  const [touched, setTouched] = useState(false);
  const problem = reasonProblem(reason);
  return (
    <Modal
      open={open}
      title="The sheet is signed off: why does this reading change?"
      okText="Save with this reason"
      okButtonProps={{ disabled: problem !== null, loading: saving }}
      onOk={() => onConfirm(reason.trim())}
      onCancel={onCancel}
      afterClose={() => {
        setReason('');
        setTouched(false);
      }}
      destroyOnHidden
    >
      <Typography.Paragraph>
        {pointLabel}: {change}
      </Typography.Paragraph>
      <Input.TextArea
        aria-label="Reason for the change"
        autoFocus
        rows={3}
        maxLength={500}
        value={reason}
        placeholder="For example: re-measured with the truck back on its wheels"
        onChange={(e) => setReason(e.target.value)}
        onBlur={() => setTouched(true)}
      />
      {touched && problem && (
        <Typography.Text type="danger" role="alert">
          {problem}
        </Typography.Text>
      )}
    </Modal>
  );
}
