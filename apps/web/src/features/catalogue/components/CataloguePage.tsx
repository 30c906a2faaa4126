import { Tab, TabList, Text, makeStyles, tokens } from '@fluentui/react-components';
import { useState } from 'react';
import { useSession } from '../../auth/hooks/useSession';
import { useSuppliers } from '../hooks/useSuppliers';
import { PartsTab } from './PartsTab';
import { PriceListImport } from './PriceListImport';
import { SuppliersTab } from './SuppliersTab';

type CatalogueTab = 'parts' | 'suppliers' | 'import';

const useStyles = makeStyles({
  page: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
});

/** Catalogue: parts with stock, suppliers and price-list import. Parts clerks and admins edit; fabricators read. */
export function CataloguePage() {
  const styles = useStyles();
  const { hasRole } = useSession();
  const canEdit = hasRole('parts-clerk', 'admin');
  const [tab, setTab] = useState<CatalogueTab>('parts');
  const suppliers = useSuppliers().data ?? [];

  return (
    <section className={styles.page} aria-labelledby="catalogue-title">
      <Text as="h1" id="catalogue-title" size={700} weight="semibold">
        Catalogue
      </Text>
      <TabList selectedValue={tab} onTabSelect={(_, d) => setTab(d.value as CatalogueTab)}>
        <Tab value="parts">Parts and stock</Tab>
        <Tab value="suppliers">Suppliers</Tab>
        {canEdit && <Tab value="import">Import price list</Tab>}
      </TabList>
      {tab === 'parts' && <PartsTab suppliers={suppliers} canEdit={canEdit} />}
      {tab === 'suppliers' && <SuppliersTab canEdit={canEdit} />}
      {tab === 'import' && canEdit && <PriceListImport suppliers={suppliers} />}
    </section>
  );
}
