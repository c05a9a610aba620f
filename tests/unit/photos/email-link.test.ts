// Stage e-mails link to the commission's photos page (product rule, issue 6).
import { describe, expect, it } from "vitest";
import { renderEmail } from "@/emails/render";

describe("commission e-mails", () => {
  it("link to the photos of the commission", async () => {
    const { html, text } = await renderEmail("stage-progress", {
      workshopName: "Fernhollow Luthiery School",
      clientName: "Ines Varga",
      commissionNumber: "2027-014",
      commissionTitle: "Seven-string fan-fret",
      stageLabel: "Fretboard and frets",
      commissionUrl: "http://localhost:3000/fernhollow/commissions/14",
    });
    expect(html).toContain('href="http://localhost:3000/fernhollow/commissions/14/photos"');
    expect(text).toContain("http://localhost:3000/fernhollow/commissions/14/photos");
  });
});
