import { Card, Col, Flex, Row, Typography } from 'antd';
import { Link } from 'react-router-dom';
import { paths, toProjectFit } from '@/config/paths';
import { SampleCatalogOffer } from '@/features/catalog/components/sample-catalog-offer';
import { useCatalogItems } from '@/features/catalog/api/get-catalog-items';
import { ProjectsPanel } from '@/features/projects/components/projects-panel';
import { HomeHeader } from './home-header';

const FIRST = { page: 1, pageSize: 1 } as const;

/**
 * The home of a one-person shop whose only customer is its owner (someone building their own truck): their own projects
 * and what to do next, before anything about quoting customers. The shop's pages stay in the menu.
 */
export function BuilderHome() {
  const engines = useCatalogItems('engines', FIRST);
  const catalogEmpty = engines.data?.total === 0;
  return (
    <>
      <HomeHeader subtitle="Your own builds and what to do next." />
      <Row gutter={[16, 16]}>
        {catalogEmpty && (
          <Col xs={24}>
            <SampleCatalogOffer canStart title="First, something to choose from" extra={<Link to={paths.catalog}>Or add your own engine and chassis in the catalog</Link>} />
          </Col>
        )}
        <Col xs={24} xl={14}>
          <Card title="My projects" extra={<Link to={paths.projects}>All</Link>}>
            <ProjectsPanel
              label="My projects"
              limit={6}
              showCustomer={false}
              emptyText="No project yet. Start one for your truck with New project."
              moreTo={paths.projects}
              rowLink={{ label: 'Fit check', to: toProjectFit }}
            />
          </Card>
        </Col>
        <Col xs={24} xl={10}>
          <Card title="Next steps">
            <ol className="builder-steps" style={{ margin: 0, paddingLeft: 20, display: 'flex', flexDirection: 'column', gap: 8 }}>
              <li>
                <Typography.Text strong>Measure the chassis.</Typography.Text> Open the project and its measurement sheet; the points come
                from the chassis you choose.
              </li>
              <li>
                <Typography.Text strong>Run the fit check.</Typography.Text> On the project&rsquo;s fit check page, choose the engine and the
                chassis under &ldquo;What goes in&rdquo;, then run it.
              </li>
              <li>
                <Typography.Text strong>Plan the parts.</Typography.Text> From the fit report, the project page builds a parts plan for what
                the swap still needs.
              </li>
            </ol>
          </Card>
        </Col>
        <Col xs={24}>
          <Card title="Working on other people’s trucks too?" size="small">
            <Flex gap={24} wrap>
              <Typography.Text>
                <Link to={paths.customers}>Customers</Link> — add the people you build for and quote their swaps.
              </Typography.Text>
              <Typography.Text>
                <Link to={paths.members}>Members</Link> — invite estimators, fabricators and the parts counter.
              </Typography.Text>
              <Typography.Text>
                <Link to={paths.shopSettings}>Shop settings</Link> — units, labor rate and tax.
              </Typography.Text>
            </Flex>
          </Card>
        </Col>
      </Row>
    </>
  );
}
