// @vitest-environment jsdom
import { cleanup, fireEvent, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import type { MapGrid } from "../../../shared/schemas/maps";
import { renderApp, routeFetchTo } from "../../helpers/client-harness";
import { signedInPerson } from "../../helpers/test-app";
import { createFilledMap, startMapsApp, TINY_RATE_MAP } from "./maps-harness";

// The map view of a stored map against the real server: a 2 × 2 rate map filled by the real
// queue and an in-process worker, then rendered by the real routes. Cell labels must carry the
// numbers the API stores; layers, filter, keyboard and the cell page work on them.

let env: Awaited<ReturnType<typeof startMapsApp>>;
let undoFetch: () => void;
let owner: Awaited<ReturnType<typeof signedInPerson>>;
let mapId: string;
let grid: MapGrid;

beforeAll(async () => {
  env = await startMapsApp({ worker: true });
  owner = await signedInPerson(env.app, "mapowner");
  ({ id: mapId } = await createFilledMap(owner.client));
  grid = (await owner.client.get(`/api/maps/${mapId}/grid?layer=stable-found`)).body;
}, 120_000);
afterAll(async () => {
  await env?.stop();
});
afterEach(() => {
  cleanup();
  undoFetch?.();
});

function openAs(person: { client: { jar: Map<string, string> } }, path: string) {
  undoFetch = routeFetchTo(env.app.baseUrl, person.client.jar);
  return renderApp(path);
}

const cellButtons = () => screen.getAllByRole("button", { name: /^μ .*, τ .*: / });

describe("map view of a stored map", () => {
  it("draws one labelled cell per grid position with the stored values", async () => {
    openAs(owner, `/maps/${mapId}`);
    expect(await screen.findByRole("heading", { name: TINY_RATE_MAP.title, level: 1 })).toBeTruthy();
    expect(screen.getByText("4 of 4 cells")).toBeTruthy();
    expect(screen.getByRole("figure", { name: `${TINY_RATE_MAP.title}: heatmap of Stable states found` })).toBeTruthy();
    const buttons = cellButtons();
    expect(buttons).toHaveLength(4);
    // Every label names its layer value as the API stored it (values[j][i] of the grid route).
    const labels = buttons.map((b) => b.getAttribute("aria-label"));
    for (const c of grid.cells) {
      const v = grid.values[c.j][c.i];
      expect(v).not.toBeNull();
      expect(labels.some((l) => l?.includes(`Stable states found ${Number(v!.toPrecision(3))}`))).toBe(true);
    }
    // The rate network's predicted line is offered and described.
    expect(screen.getByRole("checkbox", { name: /μ = g\(1\+τ\)/ })).toBeTruthy();
  });

  it("re-colours on a layer change and says shares in percent", async () => {
    openAs(owner, `/maps/${mapId}`);
    const user = userEvent.setup();
    await user.selectOptions(await screen.findByLabelText("Layer"), "converged");
    await waitFor(() => expect(cellButtons()[0].getAttribute("aria-label")).toMatch(/Runs that settled \d+(\.\d+)? %$/));
    expect(screen.getByRole("figure", { name: /heatmap of Runs that settled/ })).toBeTruthy();
  });

  it("shows a hovered cell's numbers with intervals and sample sizes", async () => {
    openAs(owner, `/maps/${mapId}`);
    const [first] = await screen.findAllByRole("button", { name: /^μ .*, τ .*: / });
    fireEvent.pointerMove(first);
    const readout = screen.getByRole("region", { name: "Cell read-out" });
    expect(await within(readout).findByText("Stable states found")).toBeTruthy();
    // K = 2 networks and K·S = 8 runs (TINY_RATE_MAP budget) appear as the intervals' n.
    expect(within(readout).getAllByText(/n = 2 networks/).length).toBeGreaterThan(0);
    expect(within(readout).getByText(/n = 8 runs/)).toBeTruthy();
  });

  it("dims the cells a filter rejects and counts the matches", async () => {
    openAs(owner, `/maps/${mapId}`);
    const user = userEvent.setup();
    await user.click(await screen.findByRole("button", { name: "Add condition" }));
    await user.selectOptions(screen.getByLabelText("Condition 1: layer"), "converged");
    const value = screen.getByLabelText(/Condition 1: value/);
    await user.clear(value);
    await user.type(value, "2");
    // No share can reach 2: nothing matches and every cell is dimmed.
    expect(await screen.findByText("0 of 4 computed cells match.")).toBeTruthy();
    expect(cellButtons().every((b) => b.getAttribute("fill-opacity") === "0.22")).toBe(true);
    await user.clear(value);
    await user.type(value, "0");
    expect(await screen.findByText("4 of 4 computed cells match.")).toBeTruthy();
  });

  it("moves through the cells with the arrow keys and opens one with Enter", async () => {
    const view = openAs(owner, `/maps/${mapId}`);
    const cells = await screen.findAllByRole("button", { name: /^μ .*, τ .*: / });
    const tabbable = cells.filter((c) => c.getAttribute("tabindex") === "0");
    expect(tabbable).toHaveLength(1);
    tabbable[0].focus();
    fireEvent.keyDown(tabbable[0], { key: "ArrowRight" });
    fireEvent.keyDown(document.activeElement!, { key: "ArrowUp" });
    expect(document.activeElement?.getAttribute("data-k")).toBe("3"); // i = 1, j = 1 on a 2 × 2 grid
    fireEvent.keyDown(document.activeElement!, { key: "Enter" });
    await waitFor(() => expect(view.location().pathname).toBe(`/maps/${mapId}/cells/1/1`));
    expect(await screen.findByRole("heading", { name: "Equilibria per network" })).toBeTruthy();
    expect(screen.getByRole("heading", { name: "What the runs did" })).toBeTruthy();
  });

  it("answers another account's private map with the not-found page", async () => {
    const stranger = await signedInPerson(env.app, "stranger");
    openAs(stranger, `/maps/${mapId}`);
    expect(await screen.findByRole("heading", { name: "Nothing here" })).toBeTruthy();
  });

  it("opens a read-only link signed out, without write buttons", async () => {
    const link = await owner.client.post(`/api/maps/${mapId}/share`);
    expect(link.status).toBe(200);
    openAs({ client: { jar: new Map() } }, `/s/${link.body.token}`);
    expect(await screen.findByRole("heading", { name: TINY_RATE_MAP.title, level: 1 })).toBeTruthy();
    expect(screen.getByText("Shared with you")).toBeTruthy();
    expect(cellButtons()).toHaveLength(4);
    expect(screen.queryByRole("button", { name: "Share" })).toBeNull();
    expect(screen.queryByRole("button", { name: "Delete" })).toBeNull();
  });
});
