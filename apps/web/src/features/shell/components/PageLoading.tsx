import { Spinner } from '@fluentui/react-components';

export interface PageLoadingProps {
  label?: string;
}

/** Shown while a page's code or the session is still loading. */
export function PageLoading({ label = 'Loading…' }: PageLoadingProps) {
  return <Spinner label={label} style={{ margin: 'auto', padding: '48px' }} />;
}
