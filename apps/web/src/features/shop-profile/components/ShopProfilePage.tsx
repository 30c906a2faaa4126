import { Button, MessageBar, MessageBarActions, MessageBarBody, Spinner, Text, makeStyles, tokens } from '@fluentui/react-components';
import { useShopProfile } from '../hooks/useShopProfile';
import { ShopProfileForm } from './ShopProfileForm';

const useStyles = makeStyles({
  page: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
});

/** Admin › Shop profile: the shop's name, time zone and sales tax rate. */
export function ShopProfilePage() {
  const styles = useStyles();
  const profile = useShopProfile();

  return (
    <section className={styles.page} aria-labelledby="shop-profile-title">
      <Text as="h1" id="shop-profile-title" size={700} weight="semibold">
        Shop profile
      </Text>
      <Text as="p">The name everyone in the shop sees at the top, the time zone of printed dates and the sales tax on order sheets.</Text>
      {profile.isPending && <Spinner label="Loading the shop profile…" />}
      {profile.isError && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>The shop profile could not be loaded: {profile.error.message}</MessageBarBody>
          <MessageBarActions>
            <Button onClick={() => void profile.refetch()}>Try again</Button>
          </MessageBarActions>
        </MessageBar>
      )}
      {profile.data && <ShopProfileForm profile={profile.data} />}
    </section>
  );
}
