import { Button, Result } from 'antd';
import { isRouteErrorResponse, useNavigate, useRouteError } from 'react-router-dom';

export type RouteErrorBoundaryProps = { section?: string };

/** errorElement of each route section: one broken page never blanks the whole app. */
export function RouteErrorBoundary({ section }: RouteErrorBoundaryProps) {
  const error = useRouteError();
  const navigate = useNavigate();

  if (isRouteErrorResponse(error) && error.status === 404) {
    return (
      <Result
        status="404"
        title="No such page"
        subTitle="The address may be mistyped, or the page moved."
        extra={<Button type="primary" onClick={() => navigate('/')}>Go to home</Button>}
      />
    );
  }

  // A new deploy replaces chunk files; a reload fetches the current ones.
  const chunkFailed = error instanceof Error && /dynamically imported module|Importing a module script failed/i.test(error.message);

  return (
    <Result
      status="error"
      title={chunkFailed ? 'Swapwright was updated' : `Something broke${section ? ` in ${section}` : ''}`}
      subTitle={
        chunkFailed
          ? 'Reload to get the newest version.'
          : 'The rest of the app still works. Try again; if it keeps happening, tell your shop owner what you were doing.'
      }
      extra={[
        <Button key="retry" type="primary" onClick={() => window.location.reload()}>
          {chunkFailed ? 'Reload' : 'Try again'}
        </Button>,
        <Button key="home" onClick={() => navigate('/')}>
          Go to home
        </Button>,
      ]}
    />
  );
}
