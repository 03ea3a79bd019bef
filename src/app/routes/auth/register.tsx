import { Link, useNavigate, useSearchParams } from "react-router-dom";
import { RegisterForm } from "../../../features/auth/components/register-form";
import { toast } from "../../../lib/toast-store";
import { safeNext, withNext } from "../../../lib/safe-next";
import { AuthLayout } from "../../layout/auth-layout";

export function RegisterPage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const next = safeNext(params);
  return (
    <AuthLayout
      title="Create your account"
      subtitle="Build maps of where random networks settle, and share them with your group."
      footer={
        <>
          Already have an account?{" "}
          <Link to={withNext("/sign-in", next, params.get("email"))} className="font-medium text-well-600 hover:underline">
            Sign in
          </Link>
        </>
      }
    >
      <RegisterForm
        defaultEmail={params.get("email") ?? ""}
        onRegistered={(user) => {
          toast.success(`Welcome, ${user.name}. You are signed in.`);
          navigate(next, { replace: true });
        }}
      />
    </AuthLayout>
  );
}
