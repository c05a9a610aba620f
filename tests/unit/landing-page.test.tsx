// The landing page renders on the server with its heading, both entry points and the safety note.
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import LandingPage from "@/app/(marketing)/page";
import MarketingLayout from "@/app/(marketing)/layout";

describe("landing page", () => {
  const html = renderToStaticMarkup(
    <MarketingLayout>
      <LandingPage />
    </MarketingLayout>,
  );

  it("states the job and links to sign-in and the calculator", () => {
    expect(html).toContain("<h1");
    expect(html).toMatch(/guitar-building schools and custom shops/);
    expect(html).toContain('href="/sign-in"');
    expect(html).toContain('href="/calculator"');
  });

  it("draws fret 12 at half of the 24-fret board's length (d12 = L/2, a textbook identity)", () => {
    // The diagram scales the board so that fret 24 (3L/4) spans 320 units: L = 320·4/3, fret 12 at L/2.
    const diagram = html.slice(html.indexOf('aria-label="Fret positions'));
    const lines = [...diagram.slice(0, diagram.indexOf("</svg>")).matchAll(/<line x1="([\d.]+)"/g)].map((m) => Number(m[1]) - 4);
    expect(lines).toHaveLength(25);
    expect(lines[12]).toBeCloseTo((320 * 4) / 3 / 2, 6);
    expect(lines[24]).toBeCloseTo(320, 6);
  });

  it("shows the string-safety caution", () => {
    expect(html).toMatch(/wear eye protection/);
  });
});
