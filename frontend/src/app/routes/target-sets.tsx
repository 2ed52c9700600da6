import { PageHeader } from '../../components/layout/page-header';
import { useMe } from '../../lib/session/get-me';
import { canManageTargets } from '../../lib/session/roles';
import { TargetSetsPanel } from '../../features/target-sets/components/target-sets-panel';

export default function TargetSetsRoute() {
  const me = useMe();
  return (
    <>
      <PageHeader
        title="Target sets"
        subtitle="The tolerances each machine is judged against, with their units and where they come from"
      />
      <TargetSetsPanel canEdit={canManageTargets(me.data?.role)} />
    </>
  );
}
