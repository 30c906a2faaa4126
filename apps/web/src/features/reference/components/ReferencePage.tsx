import { SectionIntro } from '../../shell/components/SectionIntro';

export function ReferencePage() {
  return (
    <SectionIntro
      title="Reference"
      purpose="Thread tables by family and size, with their sources, and a thread identifier: enter a measured outside diameter and threads per inch (or pitch) to see which standards and sizes match and how to tell them apart."
      notAvailableYet
    />
  );
}
