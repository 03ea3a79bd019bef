// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import { createMemoryRouter, RouterProvider } from "react-router-dom";
import { afterEach, describe, expect, it } from "vitest";
import { LinkifiedText } from "../../src/features/admin/components/linkified-text";

afterEach(cleanup);

function show(text: string) {
  const router = createMemoryRouter([{ path: "*", element: <LinkifiedText text={text} /> }]);
  render(<RouterProvider router={router} />);
  return router;
}

describe("LinkifiedText", () => {
  it("keeps same-site links inside the app and opens other sites in a new tab", () => {
    const here = window.location.origin;
    show(`Accept: ${here}/invites/abc123.\nElsewhere: https://example.org/page`);
    const inApp = screen.getByRole("link", { name: `${here}/invites/abc123` });
    expect(inApp.getAttribute("href")).toBe("/invites/abc123");
    expect(inApp.getAttribute("target")).toBeNull();
    const outside = screen.getByRole("link", { name: "https://example.org/page" });
    expect(outside.getAttribute("target")).toBe("_blank");
    expect(outside.getAttribute("rel")).toContain("noopener");
  });

  it("leaves the sentence's full stop out of the link and the text around it intact", () => {
    show("See https://example.org/a, then stop.");
    expect(screen.getByRole("link").getAttribute("href")).toBe("https://example.org/a");
    expect(document.body.textContent).toContain("See https://example.org/a, then stop.");
  });

  it("renders text without links as plain text", () => {
    show("No links here <b>at all</b>");
    expect(screen.queryByRole("link")).toBeNull();
    expect(document.body.textContent).toContain("<b>at all</b>");
  });
});
