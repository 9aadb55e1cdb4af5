import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { confirmAndAcceptInvitation, launchBrowser, newPerson, screenshot, signedInTab, signUpThroughForm, waitUntilDrawn } from "../support/browser";
import { TERM } from "@/model/glossary";
import { QUOTE_CHANGED } from "@/model/quote";
import { DEMO, signIn, uniqueEmail, waitForMail } from "../support/http";
import { insertExampleStudy, me, readPdf } from "../integration/jobs-support";
import { measurePdf } from "../integration/jobs-pdf-measure";

let browser: Browser;
let studyId: string;
beforeAll(async () => {
  browser = await launchBrowser();
  const owner = await signIn(DEMO.owner.email, DEMO.owner.password);
  const o = await me(owner);
  ({ studyId } = await insertExampleStudy(o.shopId, o.userId, `Browser study ${Date.now()}`));
});
afterAll(async () => {
  await browser?.close();
});

describe("a job in the browser, from the study to verified", () => {
  it("a builder opens a job from a study and shares it; the new customer joins from the mail, sees the fit, approves and pays; the builder records readings and verifies; the setup card prints on one page", async () => {
    const customerEmail = uniqueEmail("browser-customer");
    // ── The builder opens the job from the study and shares it.
    const { context: shop, page: bench } = await signedInTab(browser, DEMO.builder, { width: 1280, height: 900 });
    // The study page shows the library's kit prices as money with their currency (289 and 349 EUR in the example), in the studio's kit switcher and the lineup.
    await bench.goto(`/studies/${studyId}`);
    const kitOnShow = bench.getByRole("group", { name: "Kit on show" });
    await expect.poll(() => kitOnShow.getByText(/price EUR\s289\.00/).count(), { timeout: 30_000 }).toBe(1);
    expect(await kitOnShow.getByText(/price EUR\s349\.00/).count()).toBe(1);
    await bench.getByRole("tab", { name: "Lineup" }).click();
    await expect.poll(() => bench.getByTestId("lineup").getByText(/^EUR\s289\.00$/).count(), { timeout: 10_000 }).toBe(1);
    await bench.goto(`/jobs/new?studyId=${studyId}`);
    await bench.getByLabel("Title").fill("Harrow's 50 cc scooter, big bore");
    await bench.getByLabel("Customer's name").fill("Wren Calloway");
    await bench.getByLabel("Customer's e-mail").fill("not an address");
    await bench.getByRole("button", { name: "Open the job" }).click();
    await expect.poll(() => bench.getByText("That does not look like an e-mail address.").count(), { timeout: 10_000 }).toBe(1);
    expect(await bench.getByLabel("Title").inputValue()).toBe("Harrow's 50 cc scooter, big bore");
    await bench.getByLabel("Customer's e-mail").fill(customerEmail);
    await bench.getByLabel("Engine number").fill("QF50-7781");
    await bench.getByRole("button", { name: "Open the job" }).click();
    await bench.waitForURL(/\/jobs\/[0-9a-f-]{36}$/);
    const jobId = bench.url().split("/jobs/")[1];
    expect(await bench.getByTestId("job-status").textContent()).toBe("Planned");

    // ── The builder drafts the quote: the kit's price from the library, two gaskets, machining at the shop's rate.
    const quote = bench.getByRole("form", { name: "The quote" });
    expect(await quote.getByLabel(`${TERM.quoteKit.short} price`).inputValue()).toBe("289.00");
    await quote.getByRole("button", { name: "Add a part" }).click();
    await quote.getByLabel("Part", { exact: true }).fill("Base gasket");
    await quote.getByLabel("Quantity").fill("2");
    await quote.getByLabel("Each").fill("12.50");
    await quote.getByLabel(`${TERM.quoteMachining.label} time`).fill("1.3");
    await quote.getByRole("button", { name: "Save as the job's quote" }).click();
    await expect.poll(() => quote.getByText(/to the quarter hour \(0\.25/).count(), { timeout: 10_000 }).toBe(1);
    expect(await quote.getByLabel("Each").inputValue()).toBe("12.50");
    await quote.getByLabel(`${TERM.quoteMachining.label} time`).fill("1.5");
    await quote.getByRole("button", { name: "Save as the job's quote" }).click();
    await expect.poll(() => bench.getByTestId("deposit-state").textContent(), { timeout: 10_000 }).toMatch(/145\.44/);
    // 289.00 + 2 × 12.50 + 1.5 h × 60.00 = 404.00; tax 20 % = 80.80; total 484.80; deposit 30 % = 145.44 (the demo shop's rates).
    const figures = bench.getByTestId("quote-section");
    expect((await figures.getByTestId("quote-subtotal").textContent())?.replace(/\s/g, " ")).toBe("EUR 404.00");
    expect((await figures.getByTestId("quote-tax").textContent())?.replace(/\s/g, " ")).toBe("EUR 80.80");
    expect((await figures.getByTestId("quote-total").textContent())?.replace(/\s/g, " ")).toBe("EUR 484.80");
    expect((await figures.getByTestId("quote-deposit").textContent())?.replace(/\s/g, " ")).toBe("EUR 145.44");
    // The shop reads the glossary's names of the quote's lines.
    for (const t of [TERM.quoteSubtotal, TERM.quoteTotal]) expect(await figures.getByText(t.label, { exact: true }).count()).toBe(1);
    expect(await figures.getByText(`${TERM.quoteKit.label}:`).count()).toBe(1);
    // A builder drafts; the deposit of their own is the owner's, so the builder is not offered one.
    expect(await quote.getByText(/Ask a deposit other than/).count()).toBe(0);
    for (const width of [1440, 390]) {
      await bench.setViewportSize({ width, height: 900 });
      await screenshot(bench, `jobs-01a-job-quote-${width}`);
    }
    await bench.setViewportSize({ width: 1280, height: 900 });
    // The shop's own people opening the customer's page are sent to the job, not told to ask someone.
    await bench.goto(`/consult/${jobId}`);
    expect(await bench.getByText(/ask the shop.s owner/i).count()).toBe(0);
    await bench.getByRole("link", { name: "Open the job" }).click();
    await bench.waitForURL(`**/jobs/${jobId}`);
    await bench.getByRole("button", { name: "Share with the customer" }).click();
    await expect.poll(() => bench.getByText(/was invited into the shop as a customer/).count(), { timeout: 10_000 }).toBe(1);
    await screenshot(bench, "jobs-01-job-planned-and-shared");

    // ── The customer opens the link from the mail, creates an account, joins and sees the fit.
    const mail = await waitForMail(customerEmail, /shares the plan/);
    const inviteLink = mail.links.find((l) => l.includes("/invite/"))!;
    const home = await newPerson(browser, { width: 1180, height: 900 });
    const sofa = await home.newPage();
    await sofa.goto(new URL(inviteLink).pathname);
    await sofa.getByRole("link", { name: "Create an account" }).click();
    expect(await sofa.getByLabel("E-mail").inputValue()).toBe(customerEmail);
    await signUpThroughForm(sofa, { name: "Wren Calloway", password: "a-long-customer-password" });
    await sofa.waitForURL(/\/invite\//);
    // Only a confirmed address may accept: the link mailed at sign-up leads back to the invitation.
    await confirmAndAcceptInvitation(sofa, customerEmail);
    await sofa.waitForURL(/\/consult$/);
    await sofa.getByRole("link", { name: "Harrow's 50 cc scooter, big bore" }).click();
    await sofa.waitForURL(`**/consult/${jobId}`);
    await expect.poll(() => sofa.getByRole("heading", { name: "The fit" }).count(), { timeout: 10_000 }).toBe(1);
    const cautions = (await sofa.getByTestId("consult-cautions").textContent()) ?? "";
    expect(cautions).toMatch(/legal class/);
    expect(cautions).toMatch(/local rules decide/);
    expect(await sofa.getByText("Fits after the cut — once the case mouth is cut to size.").count()).toBeGreaterThan(0);
    // The 3D view has drawn what the studio asks for.
    await waitUntilDrawn(sofa, 30_000);
    await screenshot(sofa, "jobs-02-consult-fit");
    // The customer's studio is locked in customer mode: no way to the bench view and its cut controls.
    expect(await sofa.getByTestId("studio").getAttribute("data-customer")).toBe("true");
    expect(await sofa.getByTestId("customer-toggle").count()).toBe(0);
    expect(await sofa.getByText("Back to the bench view").count()).toBe(0);
    expect(await sofa.getByLabel("Planned cut").count()).toBe(0);
    expect(await sofa.getByTestId("cut-diameter").count()).toBe(0);
    // Plain words only: no shop settings, no rig; the room around the skirt is the summary's own figure.
    const page = (await sofa.locator("main").textContent()) ?? "";
    expect(page).not.toMatch(/Limits at their defaults|At the product.s defaults|Cutter setting|Depth stop|rpm|groove/i);
    const room = (await sofa.getByTestId("consult-room").textContent()) ?? "";
    const summary = (await sofa.getByTestId("clearance").first().textContent()) ?? "";
    // The summary row reads "+0.54 mm" then its minimum; the plan's sentence gives the same first figure.
    const figure = (t: string) => t.match(/\d+\.\d+/)?.[0];
    expect(figure(room)).toBeDefined();
    expect(figure(summary)).toBe(figure(room));
    // The price in plain words, approved together with the plan.
    expect((await sofa.getByTestId("quote-total").textContent())?.replace(/\s/g, " ")).toBe("EUR 484.80");
    for (const width of [1440, 390]) {
      await sofa.setViewportSize({ width, height: 900 });
      await screenshot(sofa, `jobs-02a-consult-quote-${width}`);
    }
    // The customer reads the glossary's plain words for the quote's lines.
    const price = sofa.getByRole("region", { name: "The price" });
    for (const t of [TERM.quoteTotal, TERM.quoteSubtotal]) expect(await price.getByText(t.plain, { exact: true }).count()).toBe(1);
    await sofa.setViewportSize({ width: 1180, height: 900 });
    // The shop renames a line while the customer has the page open: the approval of the old quote is refused, and said so.
    const builderApi = await signIn(DEMO.builder.email, DEMO.builder.password);
    const current = (await builderApi.get(`/api/v1/jobs/${jobId}`)).json as { job: { version: number } };
    const renamed = await builderApi.send("PUT", `/api/v1/jobs/${jobId}/quote`, { version: current.job.version, parts: [{ label: "Base gasket, paper", quantity: 2, unitMinor: 1250 }], machiningHours: 1.5 });
    expect(renamed.status, renamed.text).toBe(200);
    await sofa.getByRole("button", { name: "Approve the plan and the price" }).click();
    await expect.poll(() => sofa.getByText(QUOTE_CHANGED).count(), { timeout: 10_000 }).toBe(1);
    expect(await sofa.getByTestId("approved-line").count()).toBe(0);
    // Read again (the page shows the renamed line), then approved.
    await expect.poll(() => price.getByText("Base gasket, paper", { exact: false }).count(), { timeout: 10_000 }).toBe(1);
    await sofa.getByRole("button", { name: "Approve the plan and the price" }).click();
    await expect.poll(() => sofa.getByTestId("approved-line").count(), { timeout: 10_000 }).toBe(1);
    const approvedLine = (await sofa.getByTestId("approved-line").textContent()) ?? "";
    expect(approvedLine).toContain("The plan and the price were approved by Wren Calloway");
    expect(approvedLine).toMatch(/\d{1,2} [A-Z][a-z]{2} \d{4}, \d{2}:\d{2} \S+/); // the one date format, zone named

    // ── The deposit through the fake checkout; paid only once the signed event arrives.
    await sofa.getByRole("button", { name: /Pay the deposit \(EUR\s145\.44\)/ }).click();
    await sofa.waitForURL(/\/pay\/cs_test_/);
    expect(await sofa.getByTestId("amount").textContent()).toBe("EUR 145.44");
    await sofa.getByLabel("Card number").fill("4242 4242 4242 4242");
    await sofa.getByLabel("Name on card").fill("Wren Calloway");
    await screenshot(sofa, "jobs-03-fake-checkout");
    await sofa.getByRole("button", { name: /^Pay EUR 145\.44/ }).click();
    await sofa.waitForURL(`**/consult/${jobId}?checkout=done`);
    await expect.poll(async () => {
      await sofa.reload();
      return sofa.getByTestId("deposit-paid").count();
    }, { timeout: 10_000 }).toBe(1);
    await screenshot(sofa, "jobs-04-consult-approved-and-paid");
    // The customer cannot open the shop's library or jobs board, nor another job.
    const lib = await sofa.goto("/library");
    expect(lib?.status()).toBe(403);
    const other = await sofa.goto("/consult/00000000-0000-0000-0000-000000000000");
    expect(other?.status()).toBe(404);

    // ── The builder marks it machined, records the after-cut readings and verifies.
    await bench.reload();
    expect(await bench.getByTestId("deposit-state").textContent()).toContain("paid");
    await bench.getByRole("button", { name: "Mark machined" }).click();
    await expect.poll(() => bench.getByTestId("job-status").textContent(), { timeout: 10_000 }).toBe("Machined");
    // The quote was approved with the plan: fixed now, shown as approved.
    expect(await bench.getByTestId("quote-fixed").textContent()).toContain("Approved with the plan by Wren Calloway");
    const form = bench.getByRole("form", { name: "After-cut readings" });
    await form.getByLabel("Cut diameter readings").fill("55,10 55.12");
    await form.getByRole("button", { name: "Save and verify" }).click();
    await expect.poll(() => form.getByText("Use a point for decimals").count(), { timeout: 10_000 }).toBe(1);
    await form.getByLabel("Cut diameter readings").fill("55.10 55.12 55.09");
    await form.getByLabel("Cut depth readings").fill("25.26 25.25");
    for (const [stud, v] of [["front left", "8.2"], ["front right", "8.25"], ["rear right", "8.3"], ["rear left", "8.22"]]) await form.getByLabel(stud, { exact: true }).fill(v);
    await form.getByLabel("Gasket stack used").fill("0.2");
    await form.getByLabel("Trial fit").selectOption("goes-home");
    await form.getByLabel("Crankcase cleaned of every chip").check();
    // First a cut that came out under size: outside the plan, and verifying it is the owner's, so the builder is told so.
    await form.getByLabel("Cut diameter readings").fill("54.90 55.00 54.95");
    await form.getByRole("button", { name: "Save and verify" }).click();
    await expect.poll(() => bench.getByTestId("verdict").textContent(), { timeout: 10_000 }).toMatch(/^Outside the plan/);
    expect(await bench.getByRole("button", { name: /Mark verified|Verify as it stands/ }).count()).toBe(0);
    expect(await bench.getByTestId("verify-who").textContent()).toMatch(/the shop owner.s decision, with a recorded reason/);
    await screenshot(bench, "jobs-04a-outside-the-plan-builder");
    // Re-cut and measured again: within the plan.
    await form.getByLabel("Cut diameter readings").fill("55.10 55.12 55.09");
    await form.getByRole("button", { name: "Save and verify" }).click();
    await expect.poll(() => bench.getByTestId("verdict").textContent(), { timeout: 10_000 }).toMatch(/^Within the plan/);
    await bench.getByRole("button", { name: "Mark verified" }).click();
    await expect.poll(() => bench.getByTestId("job-status").textContent(), { timeout: 10_000 }).toBe("Verified");
    await screenshot(bench, "jobs-05-verified-plan-against-actual");

    // ── The setup card: print preview on one page with the rig settings and the cautions; the PDF says the same.
    await bench.goto(`/setup-card/${jobId}`);
    const rig = (await bench.getByTestId("rig-settings").textContent()) ?? "";
    expect(rig).toContain("44.80 mm"); // cutter setting from the core's result for the example's first kit
    expect(rig).toContain("ring in groove 2");
    const cardCautions = (await bench.getByTestId("cautions").textContent()) ?? "";
    for (const c of [/eye protection/, /without crushing it/, /bit and every fastener/, /Remove every chip/, /legal class/, /qualified machinist/]) expect(cardCautions).toMatch(c);
    await bench.emulateMedia({ media: "print" });
    await screenshot(bench, "jobs-06-setup-card-print-preview");
    // The figures on one page, then the plan and the section each on a landscape page of its own, printed at
    // the scale the caption states: a painted box of the drawing's printed size, measured in the print.
    const sheets = await bench.getByTestId("drawing-page").evaluateAll((els) => els.map((e) => ({ scale: Number(e.getAttribute("data-scale")), widthMm: Number(e.getAttribute("data-width-mm")), caption: e.textContent ?? "" })));
    expect(sheets.length).toBe(2);
    for (const format of ["A4", "Letter"] as const) {
      const printed = await bench.pdf({ format, printBackground: true, preferCSSPageSize: true });
      expect(readPdf(printed).pages, `${format} print`).toBe(3);
      const pages = await measurePdf(new Uint8Array(printed));
      sheets.forEach((sheet, i) => {
        const page = pages[i + 1];
        expect(page.widthMm, `${format} page ${i + 2} is landscape`).toBeGreaterThan(page.heightMm);
        expect(sheet.caption).toContain(`Scale 1:${1 / sheet.scale}`);
        const drawn = page.boxes.filter((b) => Math.abs(b.widthMm - sheet.widthMm) < 0.5);
        expect(drawn.length, `${format} page ${i + 2}: a box ${sheet.widthMm} mm wide`).toBeGreaterThan(0);
      });
    }
    await bench.emulateMedia({ media: "screen" });
    const download = await shop.request.get(`/api/v1/jobs/${jobId}/setup-card.pdf`);
    expect(download.headers()["content-type"]).toBe("application/pdf");
    const pdf = readPdf(await download.body());
    expect(pdf.pages).toBe(3);
    expect(pdf.fontsEmbedded).toBe(2);
    expect(pdf.text).toContain("44.80 mm");
    expect(pdf.text).toMatch(/Wear eye protection/);
    expect(pdf.text).toMatch(/legal class;\s+local\s+rules\s+decide/);
    expect(pdf.text).toContain("Plan at the deck");

    // ── Closing the job: no moves are left, and the page says so in one line instead of an empty box.
    await bench.goto(`/jobs/${jobId}`);
    await bench.getByRole("button", { name: "Close the job" }).click();
    await expect.poll(() => bench.getByTestId("job-status").textContent(), { timeout: 10_000 }).toBe("Closed");
    expect(await bench.getByTestId("job-closed").textContent()).toBe("This job is closed.");
    expect(await bench.getByRole("button", { name: /Share|Move|Mark|Back to/ }).count()).toBe(0);
    await screenshot(bench, "jobs-07-job-closed");
    await shop.close();
    await home.close();
    // One person's whole afternoon in the shop, two browsers and the payment fake: longer than one step.
  }, 240_000);
});
