import { Link, useNavigate, useSearchParams } from "react-router-dom";
import { buttonClass } from "../../../components/ui/button";
import { FormMessage } from "../../../components/ui/field";
import { ResetPasswordForm } from "../../../features/auth/components/reset-password-form";
import { AuthLayout } from "../../layout/auth-layout";

/** The page an e-mailed reset link opens: /reset?token=… */
export function ResetPasswordPage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const token = params.get("token")?.trim() ?? "";
  return (
    <AuthLayout
      title="Choose a new password"
      subtitle="The link from your e-mail works once, for one hour."
      footer={
        token ? (
          <Link to="/forgot-password" className="font-medium text-well-600 hover:underline">
            Request a new link
          </Link>
        ) : undefined
      }
    >
      {token ? (
        <ResetPasswordForm token={token} onReset={() => navigate("/sign-in", { replace: true })} />
      ) : (
        <div className="flex flex-col gap-4">
          <FormMessage message="This page needs the link from your reset e-mail. Open the link again, or ask for a new one." />
          <Link to="/forgot-password" className={buttonClass("primary", "md", "w-full")}>
            Send me a new link
          </Link>
        </div>
      )}
    </AuthLayout>
  );
}
