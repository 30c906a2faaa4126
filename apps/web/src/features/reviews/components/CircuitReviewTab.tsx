import { useSession } from '../../auth/hooks/useSession';
import { ReviewPanel } from './ReviewPanel';

export interface CircuitReviewTabProps {
  circuitId: string;
}

/** The Review tab of a circuit page: the same review the reviewer works on; read-only for other roles. */
export function CircuitReviewTab({ circuitId }: CircuitReviewTabProps) {
  const { hasRole } = useSession();
  return <ReviewPanel circuitId={circuitId} canDecide={hasRole('reviewer', 'admin')} />;
}
