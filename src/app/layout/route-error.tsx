import { isRouteErrorResponse, Link, useRouteError } from "react-router-dom";
import { buttonClass } from "../../components/ui/button";
import { Card } from "../../components/ui/card";
import { isApiError } from "../../lib/api-client";

type Explained = { status?: number; title: string; detail: string };

function explain(error: unknown): Explained {
  const status = isApiError(error) ? error.status : isRouteErrorResponse(error) ? error.status : undefined;
  // The server's own words name what is missing ("Invitation not found"); keep them.
  const said = isApiError(error) ? `${error.message.replace(/\.$/, "")}. ` : "";
  if (status === 404) return { status, title: "Nothing here", detail: `${said}The link may be wrong, or it is not shared with you.` };
  if (status === 403) return { status, title: "Not for this account", detail: `${said}Your role does not allow this page.` };
  if (isApiError(error) && error.status === 0) return { title: "Offline", detail: error.message };
  if (isApiError(error)) return { status, title: "The server refused", detail: error.message };
  return { status, title: "Something broke", detail: "An unexpected error stopped this page. Reload to try again." };
}

/** Route-level error boundary: says what happened and offers a way on. */
export function RouteError({ fullPage = false }: { fullPage?: boolean }) {
  const { status, title, detail } = explain(useRouteError());
  const body = (
    <Card className="mx-auto max-w-lg px-6 py-8 text-center">
      {status && <p className="font-mono text-sm text-ember-500">{status}</p>}
      <h1 className="mt-1 text-xl font-semibold text-ink">{title}</h1>
      <p className="mt-2 text-sm text-ink-soft">{detail}</p>
      <div className="mt-6 flex justify-center gap-2">
        <Link to="/" className={buttonClass("primary", "md")}>
          Go home
        </Link>
        <button type="button" onClick={() => window.location.reload()} className={buttonClass("secondary", "md")}>
          Reload
        </button>
      </div>
    </Card>
  );
  if (!fullPage) return <div className="py-6">{body}</div>;
  return <div className="flex min-h-screen items-center justify-center px-4">{body}</div>;
}
