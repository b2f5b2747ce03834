import { useParams } from 'react-router';
import { Card } from '../../components/ui/card';
import { Page } from '../../components/ui/page';
import { ResetPasswordForm } from '../../features/account-recovery/components/reset-password-form';

export function ResetPasswordPage() {
  const { token = '' } = useParams();
  return (
    <Page width="narrow" title="Choose a new password" description="The link from your e-mail works once, for 2 hours.">
      <Card>
        <ResetPasswordForm token={token} />
      </Card>
    </Page>
  );
}
