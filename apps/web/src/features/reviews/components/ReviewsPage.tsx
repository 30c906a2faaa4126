import { SectionIntro } from '../../shell/components/SectionIntro';

export function ReviewsPage() {
  return (
    <SectionIntro
      title="Reviews"
      purpose="Circuits submitted for review wait here. The reviewer reads each circuit's flags, acknowledges every caution with a note, and approves the revision or returns it to the fabricator."
      notAvailableYet
    />
  );
}
