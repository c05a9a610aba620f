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

  it("has a component for every template", async () => {
    expect(TEMPLATE_NAMES.sort()).toEqual(["invitation", "magic-link", "password-reset"]);
  });
});
