// @vitest-environment jsdom
import { cleanup, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import { renderApp, routeFetchTo } from "../../helpers/client-harness";
import { signedInPerson } from "../../helpers/test-app";
import { startMapsApp } from "./maps-harness";

// The new-map form against the real server (with its queue, no worker): the shared schema's
// messages on the fields, the server's estimate before launch, the server's 422 limits on the
// field they name, and a launch that lands on the new map.

let env: Awaited<ReturnType<typeof startMapsApp>>;
let undoFetch: () => void;

beforeAll(async () => {
  env = await startMapsApp({ worker: false });
});
afterAll(async () => {
  await env?.stop();
});
afterEach(() => {
  cleanup();
  undoFetch?.();
});

async function openForm(label: string) {
  const person = await signedInPerson(env.app, label);
  undoFetch = routeFetchTo(env.app.baseUrl, person.client.jar);
  const view = renderApp("/maps/new");
  await screen.findByRole("heading", { name: "New map", level: 1 });
  return { person, view, user: userEvent.setup() };
}

/** The field's own error line (FieldShell gives it role=alert beside the control). */
async function fieldError(label: string): Promise<string> {
  const input = screen.getByLabelText(label);
  const shell = input.closest("div")!;
  return (await within(shell).findByRole("alert")).textContent ?? "";
}

async function replace(user: ReturnType<typeof userEvent.setup>, label: string, value: string) {
  const input = screen.getByLabelText(label);
  await user.clear(input);
  if (value) await user.type(input, value);
}

describe("new-map form", () => {
  it("shows the shared schema's messages on the fields it rejects", async () => {
    const { user } = await openForm("formcheck");
    await replace(user, "Units N", "");
    const [muFrom] = screen.getAllByLabelText("From");
    await user.clear(muFrom);
    await user.type(muFrom, "0");
    const [muSteps] = screen.getAllByLabelText("Steps");
    await user.clear(muSteps);
    await user.type(muSteps, "65");
    await user.click(screen.getByRole("button", { name: "Launch map" }));
    expect(await fieldError("Title")).toBe("Give the map a title"); // shared/schemas/maps.ts title rule
    expect(await fieldError("Units N")).toBe("Enter a number"); // the form's message for a blank number
    expect((await within(muFrom.closest("div")!).findByRole("alert")).textContent).toBe("μ must be > 0"); // muAxisSchema
    expect((await within(muSteps.closest("div")!).findByRole("alert")).textContent).toBe("At most 64 steps (grid limit 64 × 64)"); // axisBase
    expect(screen.getByLabelText("Title").getAttribute("aria-invalid")).toBe("true");
  });

  it("asks the server for the cost before launch and shows cells and time", async () => {
    await openForm("estimator");
    const panel = await screen.findByLabelText("Cost estimate");
    // Default grid of the rate network: 10 μ steps × 6 τ steps (new-map-defaults.ts), nothing cached yet.
    const toCompute = await within(panel).findByText("Cells to compute", {}, { timeout: 15_000 });
    expect(toCompute.nextElementSibling?.textContent).toBe("60");
    expect(within(panel).getByText("Already cached").nextElementSibling?.textContent).toBe("0");
    expect(within(panel).getByText("Estimated compute time").nextElementSibling?.textContent).toMatch(/\d/);
  });

  it("puts the server's limit on the field it names", async () => {
    const { user } = await openForm("limits");
    await user.type(screen.getByLabelText("Title"), "Too many runs");
    await replace(user, "Networks per cell K", "64");
    await replace(user, "Starts per network S", "64");
    await user.click(screen.getByRole("button", { name: "Launch map" }));
    // shared/maps/limits.ts: members get at most 2048 runs per cell; 64 × 64 = 4096.
    expect(await fieldError("Starts per network S")).toMatch(/runs per cell \(networks × starts\)": at most 2048 for members, got 4096/);
  });

  it("switches to the field network's settings and checks its cross-field rule", async () => {
    const { user } = await openForm("fieldform");
    await user.click(screen.getByRole("radio", { name: /Gaussian field network/ }));
    // Field defaults of new-map-defaults.ts: N = 20, σ = 1; the rate network's g is gone.
    expect((screen.getByLabelText("Units N") as HTMLInputElement).value).toBe("20");
    expect((screen.getByLabelText("Jacobian scale σ") as HTMLInputElement).value).toBe("1");
    expect(screen.queryByLabelText("Coupling gain g")).toBeNull();
    await user.type(screen.getByLabelText("Title"), "Field with exhaustive search");
    await user.click(screen.getByRole("checkbox", { name: /Exhaustive search/ }));
    await user.click(screen.getByRole("button", { name: "Launch map" }));
    // createMapSchema's superRefine: exhaustive search only up to N = 10.
    expect(await screen.findByText("Exhaustive search is limited to N ≤ 10")).toBeTruthy();
  });

  it("launches a valid map and opens it, queued with every cell pending", async () => {
    const { user, view } = await openForm("launcher");
    await user.type(screen.getByLabelText("Title"), "Two by two");
    await replace(user, "Units N", "4");
    const steps = screen.getAllByLabelText("Steps");
    for (const s of steps) {
      await user.clear(s);
      await user.type(s, "2");
    }
    await user.click(screen.getByRole("button", { name: "Launch map" }));
    await waitFor(() => expect(view.location().pathname).toMatch(/^\/maps\/[0-9a-f-]{36}$/));
    expect(await screen.findByRole("heading", { name: "Two by two", level: 1 })).toBeTruthy();
    expect(screen.getByText("0 of 4 cells")).toBeTruthy();
    expect(screen.getAllByRole("button", { name: /: pending$/ })).toHaveLength(4);
  });
});
