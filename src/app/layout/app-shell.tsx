import { Navigate, Outlet, useNavigation } from "react-router-dom";
import { useCurrentUser } from "../../features/auth/hooks/use-current-user";
import { TopBar } from "./top-bar";

/** A thin moving line under the bar while the next page loads its data. */
function NavigationProgress() {
  const navigation = useNavigation();
  if (navigation.state === "idle") return null;
  return (
    <div role="progressbar" aria-label="Loading page" className="fixed inset-x-0 top-0 z-50 h-0.5 overflow-hidden bg-well-800">
      <div className="h-full w-1/3 animate-slide bg-ember-400" />
    </div>
  );
}

/** The signed-in frame. If the session disappears mid-use, go back to sign in. */
export function AppShell() {
  const user = useCurrentUser();
  if (user === null) return <Navigate to="/sign-in" replace />;
  if (!user) return null;
  return (
    <div className="flex min-h-screen flex-col">
      <NavigationProgress />
      <TopBar user={user} />
      <main className="mx-auto w-full max-w-6xl flex-1 px-4 py-8 sm:px-6 sm:py-10">
        <Outlet />
      </main>
      <footer className="border-t border-line">
        <div className="mx-auto flex max-w-6xl flex-wrap justify-between gap-2 px-4 py-4 text-xs text-ink-faint sm:px-6">
          <span>Equilibrist · equilibria of random networks</span>
          <span>Counts found by simulation are lower bounds of the true number.</span>
        </div>
      </footer>
    </div>
  );
}
