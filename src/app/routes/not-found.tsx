import { Link } from "react-router-dom";
import { buttonClass } from "../../components/ui/button";
import { Card } from "../../components/ui/card";

export function NotFoundPage() {
  return (
    <Card className="mx-auto mt-6 max-w-lg px-6 py-8 text-center">
      <p className="font-mono text-sm text-ember-500">404</p>
      <h1 className="mt-1 text-xl font-semibold text-ink">No page at this address</h1>
      <p className="mt-2 text-sm text-ink-soft">The link may be mistyped, or the page may have moved.</p>
      <Link to="/" className={buttonClass("primary", "md", "mt-6")}>
        Go home
      </Link>
    </Card>
  );
}
