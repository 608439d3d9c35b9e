import { Card, Col, Flex, Row, Typography } from 'antd';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { RecentCustomers } from '@/features/customers/components/recent-customers';
import { StoppedWorkNotice } from '@/features/jobs/components/stopped-work-notice';
import { ProjectsPanel } from '@/features/projects/components/projects-panel';
import { HomeHeader } from './home-header';

export function OwnerHome() {
  return (
    <>
      <HomeHeader subtitle="Where every job in the shop stands." />
      <StoppedWorkNotice to={`${paths.backgroundWork}?state=dead`} />
      <Row gutter={[16, 16]}>
        <Col xs={24} xl={12}>
          <Card title="Needs a quote" extra={<Link to={`${paths.projects}?status=parts-planned`}>All</Link>}>
            <ProjectsPanel label="Projects needing a quote" status="parts-planned" limit={5} emptyText="Nothing waiting for a quote." moreTo={`${paths.projects}?status=parts-planned`} />
          </Card>
        </Col>
        <Col xs={24} xl={12}>
          <Card title="Waiting to be measured" extra={<Link to={`${paths.projects}?status=intake`}>All</Link>}>
            <ProjectsPanel label="Projects waiting to be measured" status="intake" limit={5} emptyText="No chassis waiting to be measured." moreTo={`${paths.projects}?status=intake`} />
          </Card>
        </Col>
        <Col xs={24} xl={12}>
          <Card title="In the bay" extra={<Link to={`${paths.projects}?status=in-the-bay`}>All</Link>}>
            <ProjectsPanel label="Projects in the bay" status="in-the-bay" limit={5} emptyText="No job in the bay." moreTo={`${paths.projects}?status=in-the-bay`} />
          </Card>
        </Col>
        <Col xs={24} xl={12}>
          <Card title="Deposit paid, ready for the bay" extra={<Link to={`${paths.projects}?status=deposit-paid`}>All</Link>}>
            <ProjectsPanel label="Projects ready for the bay" status="deposit-paid" limit={5} emptyText="No paid job waiting for the bay." moreTo={`${paths.projects}?status=deposit-paid`} />
          </Card>
        </Col>
        <Col xs={24} xl={12}>
          <Card title="Latest activity">
            <ProjectsPanel label="Recently changed projects" limit={6} emptyText="No projects yet." moreTo={paths.projects} />
          </Card>
        </Col>
        <Col xs={24} xl={12}>
          <Card title="New customers" extra={<Link to={paths.customers}>All</Link>}>
            <RecentCustomers />
          </Card>
        </Col>
        <Col xs={24}>
          <Card title="Shop setup">
            <Flex gap={24} wrap>
              <Typography.Text>
                <Link to={paths.shopSettings}>Shop settings</Link> — units, labor rate, tax and shop supplies used on quotes.
              </Typography.Text>
              <Typography.Text>
                <Link to={paths.members}>Members</Link> — invite estimators, fabricators, the parts counter and customers.
              </Typography.Text>
              <Typography.Text>
                <Link to={paths.backgroundWork}>Background work</Link> — the e-mails and payment events the server sends and applies, and any that stopped.
              </Typography.Text>
            </Flex>
          </Card>
        </Col>
      </Row>
    </>
  );
}
