import { useConfirmPasswordReset } from '../../features/auth/api/confirm-password-reset.js';
import { AuthPage } from '../../features/auth/components/auth-page.js';
import { SetPasswordForm } from '../../features/auth/components/set-password-form.js';

export function ResetPasswordRoute() {
  return (
    <AuthPage intro="Choose a new password for your ship account.">
      <SetPasswordForm
        send={useConfirmPasswordReset()}
        submitLabel="Set new password"
        doneNotice="Your new password is set, and every earlier session has ended. Sign in with it."
        newLink={{ to: '/forgot-password', label: 'Ask for a new link' }}
      />
    </AuthPage>
  );
}
