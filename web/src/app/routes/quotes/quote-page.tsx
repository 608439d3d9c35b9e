import { useParams } from 'react-router-dom';
import { useSignedInUser } from '@/features/auth/api/get-current-user';
import { QuoteWorkspace } from '@/features/quotes/components/quote-workspace';
import { canWriteQuotes } from '../../navigation';

export function QuotePage() {
  const { quoteId = '' } = useParams();
  const user = useSignedInUser();
  return <QuoteWorkspace quoteId={quoteId} canWrite={canWriteQuotes(user.role)} />;
}
