import { SectionIntro } from '../../shell/components/SectionIntro';

export function OrdersPage() {
  return (
    <SectionIntro
      title="Orders"
      purpose="Order sheets are built from approved circuits, one per supplier: parts summed and rounded to how each supplier sells them, stock on hand taken off, prices totalled. Deliveries are booked into stock from here."
      notAvailableYet
    />
  );
}
