import { Link } from "react-router-dom";
import { ForgotPasswordForm } from "../../../features/auth/components/forgot-password-form";
import { AuthLayout } from "../../layout/auth-layout";

export function ForgotPasswordPage() {
  return (
    <AuthLayout
      title="Reset your password"
      subtitle="Enter the address you signed up with. We will e-mail you a link to choose a new password."
      footer={
        <Link to="/sign-in" className="font-medium text-well-600 hover:underline">
          Back to sign in
        </Link>
      }
    >
      <ForgotPasswordForm />
    </AuthLayout>
  );
}
