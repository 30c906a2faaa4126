import {
  Button,
  Spinner,
  Switch,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  Text,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { AddRegular, EditRegular } from '@fluentui/react-icons';
import { useState } from 'react';
import type { Supplier } from '../api/supplier-schema';
import { useSuppliers } from '../hooks/useSuppliers';
import { SupplierDialog } from './SupplierDialog';

export interface SuppliersTabProps {
  canEdit: boolean;
}

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  bar: { display: 'flex', justifyContent: 'space-between', alignItems: 'center' },
});

export function SuppliersTab({ canEdit }: SuppliersTabProps) {
  const styles = useStyles();
  const [showInactive, setShowInactive] = useState(false);
  const [editing, setEditing] = useState<{ supplier: Supplier | null } | null>(null);
  const { data, isPending, isError, error } = useSuppliers(showInactive);

  return (
    <div className={styles.root}>
      <div className={styles.bar}>
        <Switch label="Show inactive suppliers" checked={showInactive} onChange={(_, d) => setShowInactive(d.checked)} />
        {canEdit && (
          <Button appearance="primary" icon={<AddRegular />} onClick={() => setEditing({ supplier: null })}>
            New supplier
          </Button>
        )}
      </div>
      {isPending && <Spinner label="Loading suppliers…" />}
      {isError && <Text role="alert">The suppliers could not be loaded: {error.message}</Text>}
      {data && data.length === 0 && <Text as="p">No suppliers yet.</Text>}
      {data && data.length > 0 && (
        <Table size="small" aria-label="Suppliers">
          <TableHeader>
            <TableRow>
              <TableHeaderCell>Name</TableHeaderCell>
              <TableHeaderCell>Order e-mail</TableHeaderCell>
              <TableHeaderCell>Account number</TableHeaderCell>
              <TableHeaderCell>Phone</TableHeaderCell>
              <TableHeaderCell>Status</TableHeaderCell>
              {canEdit && <TableHeaderCell>Actions</TableHeaderCell>}
            </TableRow>
          </TableHeader>
          <TableBody>
            {data.map((supplier) => (
              <TableRow key={supplier.id}>
                <TableCell>{supplier.name}</TableCell>
                <TableCell>{supplier.email || '—'}</TableCell>
                <TableCell>{supplier.accountNumber || '—'}</TableCell>
                <TableCell>{supplier.phone || '—'}</TableCell>
                <TableCell>{supplier.active ? 'Active' : 'Inactive'}</TableCell>
                {canEdit && (
                  <TableCell>
                    <Button size="small" icon={<EditRegular />} onClick={() => setEditing({ supplier })} aria-label={`Edit ${supplier.name}`}>
                      Edit
                    </Button>
                  </TableCell>
                )}
              </TableRow>
            ))}
          </TableBody>
        </Table>
      )}
      {editing && <SupplierDialog key={editing.supplier?.id ?? 'new'} supplier={editing.supplier} onClose={() => setEditing(null)} />}
    </div>
  );
}
