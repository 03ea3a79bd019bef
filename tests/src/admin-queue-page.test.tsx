// @vitest-environment jsdom
import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { isQueueBusy } from "../../src/features/admin/api/admin-queries";
import { FILL_CELL_QUEUE, type FillCellPayload } from "../../server/queue/queues";
import { renderApp, routeFetchTo, useServedClient } from "../helpers/client-harness";
import { signedInPerson } from "../helpers/test-app";
import { rateBody } from "../server/maps/maps-fixtures";

// The admin Queue page against the real server and pg-boss (no worker runs; the test takes a
// job from pg-boss itself so one shows as running).

const served = useServedClient({ queue: true });

async function admin() {
  const person = await signedInPerson(served.app, "admin");
  await served.app.makeAdmin(person.email);
  return person;
}

function rowOf(tableName: string, text: string): HTMLElement {
  const table = screen.getByRole("table", { name: tableName });
  return within(table).getByText(text).closest("tr") as HTMLElement;
}

describe("admin queue page", () => {
  it("opens from the admin tabs and shows the idle state with every queue at zero", async () => {
    const boss = await admin();
    routeFetchTo(served.app.baseUrl, boss.client.jar);
    const view = renderApp("/admin/users");
    const user = userEvent.setup();
    await user.click(await screen.findByRole("link", { name: "Queue" }));
    expect(await screen.findByText("Nothing is running")).toBeTruthy();
    expect(view.location().pathname).toBe("/admin/queue");
    expect(within(rowOf("Jobs per queue", "fill-cell")).getAllByText("0")).toHaveLength(6);
    expect(screen.getByText("No worker has stored a cell lately")).toBeTruthy();
    // The page polls only while busy (refetchInterval follows isQueueBusy): idle here.
    expect(isQueueBusy((await boss.client.get("/api/admin/queue")).body)).toBe(false);
  });

  it("lists a waiting map, then shows its running job after the next refresh", async () => {
    const boss = await admin();
    const owner = await signedInPerson(served.app, "owner");
    const created = await owner.client.post("/api/maps", rateBody({ title: "Queue page sweep" }));
    expect(created.status).toBe(201);
    routeFetchTo(served.app.baseUrl, boss.client.jar);
    renderApp("/admin/queue");
    const mapRow = await screen.findByRole("row", { name: /Queue page sweep/ });
    expect(within(mapRow).getByText(owner.name)).toBeTruthy();
    expect(within(mapRow).getByText("0 / 9")).toBeTruthy();
    expect(screen.getByText("No job is running")).toBeTruthy();
    expect(within(rowOf("Jobs per queue", "fill-cell")).getByText("9")).toBeTruthy();

    // Let the mount's own refetch finish, so the running job can only arrive by the 5 s poll.
    await new Promise((r) => setTimeout(r, 1000));
    const [job] = await served.app.boss!.fetch<FillCellPayload>(FILL_CELL_QUEUE);
    const fetchedAt = Date.now();
    const running = await screen.findByRole("table", { name: "Running jobs" }, { timeout: 12_000 });
    expect(Date.now() - fetchedAt).toBeGreaterThan(2000);
    const link = within(running).getByRole("link", { name: "Queue page sweep" });
    expect(link.getAttribute("href")).toBe(`/maps/${created.body.id}`);
    expect(within(running).getByText(`${job.data.i}, ${job.data.j}`)).toBeTruthy();
  });
});
