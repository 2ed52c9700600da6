import { PageHeader } from '../../components/layout/page-header';
import { PeoplePanel } from '../../features/people/components/people-panel';

export default function PeopleRoute() {
  return (
    <>
      <PageHeader title="People" subtitle="Members of this workshop and what each may do" />
      <PeoplePanel />
    </>
  );
}
