import { Layout, Typography } from 'antd';
import { useParams } from 'react-router-dom';
import { QuoteAnswerPanel } from '@/features/quotes/components/quote-answer-panel';

/** The page the link in a quote e-mail opens; the signed link is the permission, no sign-in needed. */
export function QuoteAnswerPage() {
  const { token = '' } = useParams();
  return (
    <Layout style={{ minHeight: '100vh', padding: 16 }}>
      <Layout.Content style={{ maxWidth: 960, width: '100%', margin: '0 auto' }}>
        <Typography.Title level={3}>Your quote</Typography.Title>
        <QuoteAnswerPanel token={token} />
      </Layout.Content>
    </Layout>
  );
}
