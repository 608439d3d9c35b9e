import { Button, Drawer, Flex } from 'antd';
import type { ReactNode } from 'react';
import { useDrawerSize } from '@/hooks/use-drawer-size';

export type FormDrawerProps = {
  open: boolean;
  title: string;
  /** Preferred width in px; the whole screen on a phone. */
  width: number;
  submitLabel: string;
  saving: boolean;
  onSubmit: () => void;
  onClose: () => void;
  children: ReactNode;
};

/** A drawer holding one form, with Cancel and the submit button in its footer. */
export function FormDrawer({ open, title, width, submitLabel, saving, onSubmit, onClose, children }: FormDrawerProps) {
  const size = useDrawerSize(width);
  return (
    <Drawer
      open={open}
      onClose={onClose}
      title={title}
      size={size}
      destroyOnHidden
      footer={
        <Flex justify="flex-end" gap={8}>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="primary" loading={saving} onClick={onSubmit}>
            {submitLabel}
          </Button>
        </Flex>
      }
    >
      {children}
    </Drawer>
  );
}
