import { Button, MessageBar, MessageBarActions, MessageBarBody, Spinner, Text, makeStyles, tokens } from '@fluentui/react-components';
import { useSession } from '../../auth/hooks/useSession';
import { safetyPrecedence } from '../../shell/utils/safety-cautions';
import { useShopRules } from '../hooks/useShopRules';
import { ShopRulesForm } from './ShopRulesForm';

const useStyles = makeStyles({
  page: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
});

/** Admin › Shop rules: the thresholds the rules engine checks every circuit against. */
export function ShopRulesPage() {
  const styles = useStyles();
  const { hasRole } = useSession();
  const canEdit = hasRole('admin');
  const shopRules = useShopRules();

  return (
    <section className={styles.page} aria-labelledby="shop-rules-title">
      <Text as="h1" id="shop-rules-title" size={700} weight="semibold">
        Shop rules
      </Text>
      <Text as="p">
        The thresholds the checks use on every circuit: clamp spacing, heat clearance, slack, cut rounding. Where sources
        disagree, the shop decides; each default shows where it comes from. Lengths take fractions: 1 1/2, 1-1/2 or 1.5.
      </Text>
      <Text as="p">{safetyPrecedence}</Text>
      {!canEdit && (
        <MessageBar intent="info">
          <MessageBarBody>Only an admin can change the shop rules.</MessageBarBody>
        </MessageBar>
      )}
      {shopRules.isPending && <Spinner label="Loading the shop rules…" />}
      {shopRules.isError && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>The shop rules could not be loaded: {shopRules.error.message}</MessageBarBody>
          <MessageBarActions>
            <Button onClick={() => void shopRules.refetch()}>Try again</Button>
          </MessageBarActions>
        </MessageBar>
      )}
      {shopRules.data && <ShopRulesForm record={shopRules.data} canEdit={canEdit} />}
    </section>
  );
}
