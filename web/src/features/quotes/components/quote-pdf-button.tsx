import { Button } from 'antd';
import { useState } from 'react';
import { downloadQuotePdf } from '../api/get-quote-pdf';

export interface QuotePdfButtonProps {
  quoteId: string;
  /** The quote's label ("Q-0003"). */
  label: string;
  revision: number;
  /** A builder's own budget: named and worded as a budget. */
  forMyself?: boolean;
  children?: React.ReactNode;
}

/** Downloads a revision's PDF through the session, busy while it is fetched. */
export function QuotePdfButton({ quoteId, label, revision, forMyself = false, children }: QuotePdfButtonProps) {
  const [loading, setLoading] = useState(false);
  const fileName = `${forMyself ? 'budget' : 'quote'}-${label}-revision-${revision}.pdf`;
  return (
    <Button
      loading={loading}
      onClick={() => {
        setLoading(true);
        // A failed download is told by the API client's error notice.
        void downloadQuotePdf(quoteId, fileName, revision)
          .catch(() => undefined)
          .finally(() => setLoading(false));
      }}
    >
      {children ?? 'Download PDF'}
    </Button>
  );
}
