import { Link as RouterLink, useParams } from 'react-router-dom';
import { Link } from '@mui/material';
import { paths } from '../../config/paths';
import { PageHeader } from '../../components/layout/page-header';
import { LoadingState } from '../../components/states/loading-state';
import { ErrorState } from '../../components/states/error-state';
import { useMe } from '../../lib/session/get-me';
import { canRecord } from '../../lib/session/roles';
import { useMachine } from '../../features/machines/api/get-machine';
import { useHolePattern } from '../../features/hole-patterns/api/get-hole-pattern';
import { HolePatternDetails } from '../../features/hole-patterns/components/hole-pattern-details';

export default function HolePatternRoute() {
  const { machineId = '', patternId = '' } = useParams();
  const me = useMe();
  const machine = useMachine(machineId);
  const pattern = useHolePattern(patternId);
  if (pattern.isPending || machine.isPending) return <LoadingState label="Opening the pattern…" />;
  if (pattern.isError) return <ErrorState error={pattern.error} onRetry={() => pattern.refetch()} />;
  if (machine.isError) return <ErrorState error={machine.error} onRetry={() => machine.refetch()} />;
  const templatesTab = `${paths.machine(machineId)}?tab=templates`;
  return (
    <>
      <PageHeader
        title={pattern.data.name}
        subtitle={
          <>
            <Link component={RouterLink} to={templatesTab}>
              {machine.data.name}
            </Link>{' '}
            · hole pattern · {pattern.data.holes.length} holes
          </>
        }
      />
      <HolePatternDetails pattern={pattern.data} canEdit={canRecord(me.data?.role)} afterDelete={templatesTab} />
    </>
  );
}
