import { Card, Text, makeStyles, tokens } from '@fluentui/react-components';
import { Link, Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { Wordmark } from '../../shell/components/Wordmark';
import { useSession } from '../hooks/useSession';
import { safeReturnPath } from '../utils/safe-return-path';
import { SignInForm } from './SignInForm';

const useStyles = makeStyles({
  page: {
    flexGrow: 1,
    display: 'flex',
    alignItems: 'center',
    justifyContent: 'center',
    padding: tokens.spacingHorizontalL,
    backgroundColor: tokens.colorNeutralBackground2,
  },
  card: { width: '100%', maxWidth: '380px', padding: tokens.spacingHorizontalXXL, gap: tokens.spacingVerticalL },
  header: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS },
});

export function SignInPage() {
  const styles = useStyles();
  const { state, signIn } = useSession();
  const navigate = useNavigate();
  const [searchParams] = useSearchParams();
  const next = safeReturnPath(searchParams.get('next'));

  if (state.status === 'signed-in') return <Navigate to={next} replace />;

  return (
    <main className={styles.page}>
      <Card className={styles.card}>
        <div className={styles.header}>
          <Wordmark size="large" />
          <Text as="h1" size={500} weight="semibold">
            Sign in to your shop
          </Text>
          <Text size={200}>Plan, check and order the fluid lines of your builds.</Text>
        </div>
        <SignInForm
          onSignIn={({ email, password }) => signIn(email, password)}
          onSignedIn={() => navigate(next, { replace: true })}
        />
        <Link to="/forgot-password">Forgot password?</Link>
      </Card>
    </main>
  );
}
