import { SectionIntro } from '../../shell/components/SectionIntro';

export function CataloguePage() {
  return (
    <SectionIntro
      title="Catalogue"
      purpose="The shop's parts: hose, hose ends, adapters, seals, clamps and sleeves, with their suppliers, prices and stock. Parts clerks keep it up to date and import supplier price lists; fabricators pick parts from it."
      notAvailableYet
    />
  );
}
