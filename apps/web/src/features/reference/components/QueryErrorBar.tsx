import { Button, MessageBar, MessageBarActions, MessageBarBody } from '@fluentui/react-components';

export interface QueryErrorBarProps {
  /** What could not be loaded, in words: "The thread table". */
  what: string;
  error: Error;
  onRetry(): void;
}

export function QueryErrorBar({ what, error, onRetry }: QueryErrorBarProps) {
  return (
    <MessageBar intent="error" role="alert">
      <MessageBarBody>
        {what} could not be loaded: {error.message}
      </MessageBarBody>
      <MessageBarActions>
        <Button onClick={onRetry}>Try again</Button>
      </MessageBarActions>
    </MessageBar>
  );
}
