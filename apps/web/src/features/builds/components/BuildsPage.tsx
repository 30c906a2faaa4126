import { SafetyNote } from '../../shell/components/SafetyNote';
import { SectionIntro } from '../../shell/components/SectionIntro';

export function BuildsPage() {
  return (
    <SectionIntro
      title="Builds"
      purpose="Each build is one vehicle job for one customer. Its circuits are sketched over photos of the vehicle, checked line by line and turned into a cut list and an order sheet."
      notAvailableYet
    >
      <SafetyNote />
    </SectionIntro>
  );
}
