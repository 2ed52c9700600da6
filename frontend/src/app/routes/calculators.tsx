import { PageHeader } from '../../components/layout/page-header';
import { CalculatorsPanel } from '../../features/calculators/components/calculators-panel';

export default function CalculatorsRoute() {
  return (
    <>
      <PageHeader
        title="Calculators"
        subtitle="Work out a result from readings without saving anything to a machine file"
      />
      <CalculatorsPanel />
    </>
  );
}
