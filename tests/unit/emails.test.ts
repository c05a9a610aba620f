// The react-email templates render to HTML and plain text with the workshop's name and the link.
import { describe, expect, it } from "vitest";
import { renderEmail } from "@/emails/render";
import { subjectFor, TEMPLATE_NAMES } from "@/lib/outbox/templates";

const expiresAt = "2027-03-08T12:00:00.000Z";

describe("e-mail templates", () => {
  it("renders an invitation with the workshop's name on the layout", async () => {
    const props = { workshopName: "Fernhollow Luthiery School", inviterName: "Maren Østby", role: "builder" as const, acceptUrl: "http://localhost:3000/invitations/abc", expiresAt };
    const { html, text } = await renderEmail("invitation", props);
    expect(html).toContain("Fernhollow Luthiery School");
    expect(html).toContain('href="http://localhost:3000/invitations/abc"');
    expect(text).toContain("http://localhost:3000/invitations/abc");
    expect(text).toMatch(/as builder/);
    expect(subjectFor("invitation", props)).toBe("Maren Østby invited you to Fernhollow Luthiery School on Scalewright");
  });

  it("renders the sign-in link and the reset link", async () => {
    const link = await renderEmail("magic-link", { signInUrl: "http://localhost:3000/api/auth/callback/email-link?token=t&email=a%40example.com", expiresAt });
    expect(link.html).toContain("token=t&amp;email=a%40example.com");
    expect(link.text).toContain("Sign in");
    const reset = await renderEmail("password-reset", { resetUrl: "http://localhost:3000/reset/xyz", expiresAt, name: "Ada" });
    expect(reset.html).toContain("/reset/xyz");
    expect(reset.text).toContain("Hello Ada");
  });

  it("refuses props that do not fit the template", async () => {
    await expect(renderEmail("invitation", { workshopName: "X" })).rejects.toThrow();
  });

  const commission = { workshopName: "Fernhollow Luthiery School", clientName: "Ines Varga", commissionNumber: "2027-014", commissionTitle: "Seven-string fan-fret" };

  it("renders every commission update with the commission link and stage", async () => {
    const props = {
      ...commission,
      stageLabel: "Neck carving",
      note: "Truss rod fitted.",
      commissionUrl: "http://localhost:3000/fernhollow/commissions/14",
    };
    const commissionTemplates = TEMPLATE_NAMES.filter((t) => !["invitation", "magic-link", "password-reset", "payment-receipt"].includes(t));
    expect(commissionTemplates.length).toBeGreaterThan(5);
    for (const t of commissionTemplates) {
      const { html, text } = await renderEmail(t, props);
      expect(html, t).toContain('href="http://localhost:3000/fernhollow/commissions/14"');
      expect(html, t).toContain("Fernhollow Luthiery School");
      expect(text, t).toContain("2027-014");
      expect(subjectFor(t, props as never), t).toContain("2027-014");
    }
  });

  it("renders a payment receipt with the amount, the reference and the payments link", async () => {
    const props = {
      ...commission,
      invoiceLabel: "deposit",
      amount: "€900.00",
      paidAt: expiresAt,
      method: "Card (visa) ending 4242",
      reference: "ch_test_123",
      paymentsUrl: "http://localhost:3000/fernhollow/commissions/14/payments",
    };
    const { html, text } = await renderEmail("payment-receipt", props);
    expect(html).toContain('href="http://localhost:3000/fernhollow/commissions/14/payments"');
    expect(html).toContain("Fernhollow Luthiery School");
    expect(text).toContain("€900.00");
    expect(text).toContain("ch_test_123");
    expect(text).toContain("ending 4242");
    expect(subjectFor("payment-receipt", props)).toBe("Receipt: deposit of €900.00 for 2027-014 Seven-string fan-fret");
    await expect(renderEmail("payment-receipt", { ...props, paymentsUrl: "not a link" })).rejects.toThrow();
  });

  it("has a component for every template", async () => {
    // Every name in the props table must render: a template without a component throws here.
    for (const t of TEMPLATE_NAMES) {
      await expect(renderEmail(t, {}), t).rejects.not.toThrow(/unknown e-mail template/);
    }
  });
});
