import { useAcceptInvitation } from '../../features/auth/api/accept-invitation.js';
import { AuthPage } from '../../features/auth/components/auth-page.js';
import { SetPasswordForm } from '../../features/auth/components/set-password-form.js';

export function InvitationRoute() {
  return (
    <AuthPage intro="You have been invited to the live launch board. Choose the password you will sign in with.">
      <SetPasswordForm
        send={useAcceptInvitation()}
        submitLabel="Set my password"
        doneNotice="Your password is set. Sign in with your e-mail and the new password."
        newLink={null}
      />
    </AuthPage>
  );
}
