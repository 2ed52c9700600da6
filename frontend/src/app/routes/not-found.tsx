import { Link as RouterLink } from 'react-router-dom';
import { Button } from '@mui/material';
import { EmptyState } from '../../components/states/empty-state';
import { paths } from '../../config/paths';

export function NotFoundRoute() {
  return (
    <EmptyState
      title="Page not found"
      action={
        <Button component={RouterLink} to={paths.home} variant="contained">
          Go to machines
        </Button>
      }
    >
      There is nothing at this address. It may have moved, or the link may be mistyped.
    </EmptyState>
  );
}
