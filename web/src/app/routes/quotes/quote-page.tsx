import { Button } from 'antd';
import { useNavigate, useParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { useSignedInUser } from '@/features/auth/api/get-current-user';
import { CustomerQuotePanel } from '@/features/quotes/components/quote-answer-panel';
import { QuoteWorkspace } from '@/features/quotes/components/quote-workspace';
import { paths, toProjectDetail } from '@/config/paths';
import { useQuote } from '@/features/quotes/api/get-quote';
import { useShop } from '@/features/shop/api/get-shop';
import { canWriteQuotes } from '../../navigation';

export function QuotePage() {
  const { quoteId = '' } = useParams();
  const user = useSignedInUser();
  const navigate = useNavigate();
  const isCustomer = user.role === 'customer';
  const quote = useQuote(quoteId);
  const shop = useShop({ enabled: !isCustomer });
  if (isCustomer) {
    // the customer reads the quote of their own project (the API scopes it), accepts or declines and pays the deposit
    return (
      <>
        <PageHeader eyebrow="Quote" title="Your quote" extra={<Button onClick={() => navigate(quote.data ? toProjectDetail(quote.data.projectId) : paths.myProjects)}>Back to the project</Button>} />
        <CustomerQuotePanel quoteId={quoteId} />
      </>
    );
  }
  // the shop's own day dates its quotes; UTC (what the API assumes of a shop without a zone) until the shop is read
  return <QuoteWorkspace quoteId={quoteId} canWrite={canWriteQuotes(user.role)} timeZone={shop.data?.timeZone ?? 'UTC'} />;
}
