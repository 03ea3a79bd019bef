/**
 * API path strings shared by the server (Express route patterns, `apiRoutes`) and the client
 * (concrete URLs, `apiPaths`). Change a path here and both sides follow.
 */
export const apiRoutes = {
  health: "/api/health",
  auth: {
    register: "/api/auth/register",
    login: "/api/auth/login",
    logout: "/api/auth/logout",
    me: "/api/auth/me",
    forgot: "/api/auth/forgot",
    reset: "/api/auth/reset",
  },
  groups: {
    list: "/api/groups",
    detail: "/api/groups/:groupId",
    invites: "/api/groups/:groupId/invites",
    invite: "/api/groups/:groupId/invites/:inviteId",
    member: "/api/groups/:groupId/members/:userId",
    leave: "/api/groups/:groupId/leave",
  },
  invites: {
    detail: "/api/invites/:token",
    accept: "/api/invites/:token/accept",
  },
  admin: {
    users: "/api/admin/users",
    user: "/api/admin/users/:userId",
    groups: "/api/admin/groups",
    outbox: "/api/admin/outbox",
    queue: "/api/admin/queue",
  },
  theory: {
    field: "/api/theory/field",
    rate: "/api/theory/rate",
    boundary: "/api/theory/boundary",
  },
  maps: {
    list: "/api/maps",
    detail: "/api/maps/:id",
    cancel: "/api/maps/:id/cancel",
    grid: "/api/maps/:id/grid",
    cell: "/api/maps/:id/cells/:i/:j",
    couplings: "/api/maps/:id/cells/:i/:j/networks/:k/couplings.:format",
    exportCsv: "/api/maps/:id/export.csv",
    exportJson: "/api/maps/:id/export.json",
    share: "/api/maps/:id/share",
    events: "/api/maps/:id/events",
    shared: "/api/shared/:token",
  },
  probes: {
    list: "/api/probes",
    detail: "/api/probes/:id",
    search: "/api/probes/:id/search",
    equilibrium: "/api/probes/:id/equilibria/:e",
  },
  review: {
    replicate: "/api/maps/:id/replicate",
    compare: "/api/maps/:id/compare/:otherId",
    boundary: "/api/maps/:id/boundary",
    report: "/api/maps/:id/report",
    import: "/api/maps/import",
    about: "/api/about",
  },
  account: {
    preferences: "/api/account/preferences",
  },
} as const;

const seg = encodeURIComponent;

/** Concrete URLs for the client (and tests). */
export const apiPaths = {
  health: apiRoutes.health,
  auth: apiRoutes.auth,
  groups: {
    list: apiRoutes.groups.list,
    detail: (groupId: string) => `/api/groups/${seg(groupId)}`,
    invites: (groupId: string) => `/api/groups/${seg(groupId)}/invites`,
    invite: (groupId: string, inviteId: string) => `/api/groups/${seg(groupId)}/invites/${seg(inviteId)}`,
    member: (groupId: string, userId: string) => `/api/groups/${seg(groupId)}/members/${seg(userId)}`,
    leave: (groupId: string) => `/api/groups/${seg(groupId)}/leave`,
  },
  invites: {
    detail: (token: string) => `/api/invites/${seg(token)}`,
    accept: (token: string) => `/api/invites/${seg(token)}/accept`,
  },
  admin: {
    users: apiRoutes.admin.users,
    user: (userId: string) => `/api/admin/users/${seg(userId)}`,
    groups: apiRoutes.admin.groups,
    outbox: apiRoutes.admin.outbox,
    queue: apiRoutes.admin.queue,
  },
  theory: apiRoutes.theory,
  maps: {
    list: apiRoutes.maps.list,
    detail: (id: string) => `/api/maps/${seg(id)}`,
    cancel: (id: string) => `/api/maps/${seg(id)}/cancel`,
    grid: (id: string) => `/api/maps/${seg(id)}/grid`,
    cell: (id: string, i: number, j: number) => `/api/maps/${seg(id)}/cells/${i}/${j}`,
    couplings: (id: string, i: number, j: number, k: number, format: "npy" | "csv") =>
      `/api/maps/${seg(id)}/cells/${i}/${j}/networks/${k}/couplings.${format}`,
    exportCsv: (id: string) => `/api/maps/${seg(id)}/export.csv`,
    exportJson: (id: string) => `/api/maps/${seg(id)}/export.json`,
    share: (id: string) => `/api/maps/${seg(id)}/share`,
    events: (id: string) => `/api/maps/${seg(id)}/events`,
    shared: (token: string) => `/api/shared/${seg(token)}`,
  },
  probes: {
    list: apiRoutes.probes.list,
    detail: (id: string) => `/api/probes/${seg(id)}`,
    search: (id: string) => `/api/probes/${seg(id)}/search`,
    equilibrium: (id: string, e: number, format: "csv" | "json" = "json") => `/api/probes/${seg(id)}/equilibria/${e}?format=${format}`,
  },
  review: {
    replicate: (id: string) => `/api/maps/${seg(id)}/replicate`,
    compare: (id: string, otherId: string) => `/api/maps/${seg(id)}/compare/${seg(otherId)}`,
    boundary: (id: string) => `/api/maps/${seg(id)}/boundary`,
    report: (id: string) => `/api/maps/${seg(id)}/report`,
    import: apiRoutes.review.import,
    about: apiRoutes.review.about,
  },
  account: apiRoutes.account,
} as const;

/** Client pages that e-mails link to (the server builds `${APP_URL}${page}`). */
export const pagePaths = {
  reset: (token: string) => `/reset?token=${seg(token)}`,
  invite: (token: string) => `/invites/${seg(token)}`,
  /** Read-only view of a shared map for signed-out readers. */
  sharedMap: (token: string) => `/s/${seg(token)}`,
  /** A map's page (the "map finished" e-mail links here). */
  map: (id: string) => `/maps/${seg(id)}`,
} as const;
