import { Link, useNavigate, useSearchParams } from "react-router-dom";
import { SignInForm } from "../../../features/auth/components/sign-in-form";
import { safeNext, withNext } from "../../../lib/safe-next";
import { AuthLayout } from "../../layout/auth-layout";

export function SignInPage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const next = safeNext(params);
  return (
    <AuthLayout
      title="Sign in"
      subtitle="Welcome back. Your maps and groups are where you left them."
      footer={
        <>
          New to Equilibrist?{" "}
          <Link to={withNext("/register", next, params.get("email"))} className="font-medium text-well-600 hover:underline">
            Create an account
          </Link>
        </>
      }
    >
      <SignInForm defaultEmail={params.get("email") ?? ""} onSignedIn={() => navigate(next, { replace: true })} />
    </AuthLayout>
  );
}
