import { useQueryClient, type QueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { createBrowserRouter, redirect, RouterProvider, type RouteObject } from "react-router-dom";
import { LoadingBlock } from "../components/ui/spinner";
import { AppShell } from "./layout/app-shell";
import { RouteError } from "./layout/route-error";
import { AdminGroupsPage, adminGroupsLoader } from "./routes/admin/admin-groups";
import { AdminLayout } from "./routes/admin/admin-layout";
import { AdminOutboxPage, adminOutboxLoader } from "./routes/admin/admin-outbox";
import { AdminQueuePage, adminQueueLoader } from "./routes/admin/admin-queue";
import { AdminUsersPage, adminUsersLoader } from "./routes/admin/admin-users";
import { ForgotPasswordPage } from "./routes/auth/forgot-password";
import { requireAdmin, requireUser, signedOutOnly } from "./routes/auth/guards";
import { RegisterPage } from "./routes/auth/register";
import { ResetPasswordPage } from "./routes/auth/reset-password";
import { SignInPage } from "./routes/auth/sign-in";
import { GroupDetailPage, groupDetailLoader } from "./routes/groups/group-detail";
import { GroupsListPage, groupsListLoader } from "./routes/groups/groups-list";
import { HomePage, homeLoader } from "./routes/home/home";
import { InvitationPage, invitationLoader } from "./routes/invites/invitation";
import { CellDetailPage, cellDetailLoader } from "./routes/maps/cell-detail";
import { MapViewPage, mapViewLoader } from "./routes/maps/map-view";
import { NewMapPage, newMapLoader } from "./routes/maps/new-map";
import { SharedCellPage, sharedCellLoader, SharedLayout, SharedMapPage, sharedMapLoader } from "./routes/maps/shared-map";
import { NotFoundPage } from "./routes/not-found";
import { ProbeDetailPage, probeDetailLoader } from "./routes/probes/probe-detail";
import { ProbesListPage, probesListLoader } from "./routes/probes/probes-list";
import { AccountPage, accountLoader } from "./routes/account/account";
import { ComparePage, compareLoader } from "./routes/review/compare";
import { ImportMapPage } from "./routes/review/import-map";
import { ReportPage, reportLoader } from "./routes/review/report";

/**
 * Every page of the client. Signed-out pages sit at the top; the signed-in area shares the
 * shell (whose loader sends strangers to sign in) and one error boundary inside it, so a
 * failing page keeps the top bar. Read-only map links (/s/:token) have their own bare frame,
 * open to signed-out readers. Later areas (probes, reports) add children here.
 */
export function createRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      id: "root",
      errorElement: <RouteError fullPage />,
      hydrateFallbackElement: <LoadingBlock className="min-h-screen" label="Starting Equilibrist…" />,
      children: [
        { path: "sign-in", loader: signedOutOnly(queryClient), element: <SignInPage /> },
        { path: "register", loader: signedOutOnly(queryClient), element: <RegisterPage /> },
        { path: "forgot-password", element: <ForgotPasswordPage /> },
        { path: "reset", element: <ResetPasswordPage /> },
        { path: "invites/:token", loader: invitationLoader(queryClient), element: <InvitationPage /> },
        {
          path: "s/:token",
          element: <SharedLayout />,
          children: [
            {
              errorElement: <RouteError />,
              children: [
                { index: true, loader: sharedMapLoader(queryClient), element: <SharedMapPage /> },
                { path: "cells/:i/:j", loader: sharedCellLoader(queryClient), element: <SharedCellPage /> },
              ],
            },
          ],
        },
        // The printable report has no app chrome (it prints as it shows); its loader asks for a user.
        { path: "maps/:mapId/report", loader: reportLoader(queryClient), element: <ReportPage />, errorElement: <RouteError fullPage /> },
        {
          id: "signed-in",
          loader: requireUser(queryClient),
          element: <AppShell />,
          children: [
            {
              errorElement: <RouteError />,
              children: [
                { index: true, loader: homeLoader(queryClient), element: <HomePage /> },
                { path: "maps/new", loader: newMapLoader(queryClient), element: <NewMapPage /> },
                { path: "maps/:mapId", loader: mapViewLoader(queryClient), element: <MapViewPage /> },
                { path: "maps/:mapId/cells/:i/:j", loader: cellDetailLoader(queryClient), element: <CellDetailPage /> },
                { path: "maps/import", element: <ImportMapPage /> },
                { path: "maps/:mapId/compare/:otherId", loader: compareLoader(queryClient), element: <ComparePage /> },
                { path: "account", loader: accountLoader(queryClient), element: <AccountPage /> },
                { path: "probes", loader: probesListLoader(queryClient), element: <ProbesListPage /> },
                { path: "probes/:probeId", loader: probeDetailLoader(queryClient), element: <ProbeDetailPage /> },
                { path: "groups", loader: groupsListLoader(queryClient), element: <GroupsListPage /> },
                { path: "groups/:groupId", loader: groupDetailLoader(queryClient), element: <GroupDetailPage /> },
                {
                  path: "admin",
                  loader: requireAdmin(queryClient),
                  element: <AdminLayout />,
                  children: [
                    { index: true, loader: () => redirect("/admin/users") },
                    { path: "users", loader: adminUsersLoader(queryClient), element: <AdminUsersPage /> },
                    { path: "groups", loader: adminGroupsLoader(queryClient), element: <AdminGroupsPage /> },
                    { path: "outbox", loader: adminOutboxLoader(queryClient), element: <AdminOutboxPage /> },
                    { path: "outbox/:messageId", loader: adminOutboxLoader(queryClient), element: <AdminOutboxPage /> },
                    { path: "queue", loader: adminQueueLoader(queryClient), element: <AdminQueuePage /> },
                  ],
                },
                { path: "*", element: <NotFoundPage /> },
              ],
            },
          ],
        },
      ],
    },
  ];
}

export function AppRouter() {
  const queryClient = useQueryClient();
  const [router] = useState(() => createBrowserRouter(createRoutes(queryClient)));
  return <RouterProvider router={router} />;
}
