import { PageHeader } from '../../components/layout/page-header';
import { WorkshopActivity } from '../../features/history/components/workshop-activity';

export default function ActivityRoute() {
  return (
    <>
      <PageHeader
        title="Activity"
        subtitle="Who did what and when in this workshop, with every value before and after. Kept for good: nothing here can be changed or deleted."
      />
      <WorkshopActivity />
    </>
  );
}
