import { AuthPage } from '../../features/auth/components/auth-page.js';
import { ForgotPasswordForm } from '../../features/auth/components/forgot-password-form.js';

export function ForgotPasswordRoute() {
  return (
    <AuthPage intro="Forgot your password? Enter your e-mail and we send you a link to choose a new one.">
      <ForgotPasswordForm />
    </AuthPage>
  );
}
