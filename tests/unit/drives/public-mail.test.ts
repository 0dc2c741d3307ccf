import { describe, expect, it } from "vitest";
import { binFullAlert, confirmationAddressKey, pledgeConfirmation } from "@/lib/drives/public-mail";

const attack = "WIN A PRIZE http://prize.example/claim\r\nBcc: everyone@x.example www.spam.example";

const pledge = (donorName: string) =>
  pledgeConfirmation({
    driveName: "Winter can drive",
    groupName: "Larkhollow Warm Rooms Circle",
    pointName: "North porch",
    pointHours: "Mon–Fri 9–17",
    bags: 3,
    bringOn: "2026-12-12",
    donorName,
    driveUrl: "http://127.0.0.1:3000/drives/winter",
  });

describe("pledge confirmation", () => {
  it("keeps the donor's text out of the subject and the first line, and quotes it inert", () => {
    const mail = pledge(attack);
    const [first, ...rest] = mail.text.split("\n");
    expect(mail.subject).toBe("Your pledge for the Winter can drive");
    expect(first).toBe("Thank you for your pledge to the Winter can drive.");
    const nameLine = rest.find((l) => l.startsWith("Name given with the pledge:"));
    expect(nameLine).toBeDefined();
    expect(nameLine).not.toMatch(/:\/\/|www\.|prize\.example|@/);
    expect(nameLine).toContain("prize[.]example/claim");
    // No line of the message starts with the attacker's words (a header-like "Bcc:" line).
    expect(rest.some((l) => l.startsWith("Bcc"))).toBe(false);
    // The only link left is our own drive page.
    expect(mail.text.match(/https?:\/\/\S+/g)).toEqual(["http://127.0.0.1:3000/drives/winter"]);
  });

  it("says what was pledged where, and leaves the name line out when none was given", () => {
    const mail = pledge("");
    // The day in words (CLDR en-GB long date), not the ISO code.
    expect(mail.text).toContain("about 3 bags of cans to North porch on 12 December 2026");
    expect(mail.text).toContain("Opening hours: Mon–Fri 9–17.");
    expect(mail.text).not.toContain("Name given");
    expect(mail.text).not.toMatch(/\n\n\n/);
  });
});

describe("bin-full alert", () => {
  it("quotes the note inert, below the first line", () => {
    const mail = binFullAlert({ pointName: "North porch", levelLabel: "Full — no room left", note: attack, driveUrl: "http://127.0.0.1:3000/drives/winter" });
    const [first, second] = mail.text.split("\n");
    expect(mail.subject).toBe("Bin filling up: North porch");
    expect(first).toBe("Someone at North porch reports the bin is: Full — no room left.");
    expect(second).toMatch(/^Their note .*"WIN A PRIZE prize\[\.\]example\/claim Bcc: everyone \[at\] x\[\.\]example www\[\.\]spam\[\.\]example"$/);
    expect(mail.text.match(/https?:\/\/\S+/g)).toEqual(["http://127.0.0.1:3000/drives/winter"]);
  });
});

describe("the address key for one confirmation a day", () => {
  it("treats case and a +tag as the same inbox, and other addresses as others", () => {
    const key = confirmationAddressKey("Donor@Example.test");
    expect(confirmationAddressKey(" donor+1@example.test ")).toBe(key);
    expect(confirmationAddressKey("donor+anything@EXAMPLE.test")).toBe(key);
    expect(confirmationAddressKey("donor2@example.test")).not.toBe(key);
    expect(confirmationAddressKey("donor@example.other")).not.toBe(key);
    expect(key).toMatch(/^[0-9a-f]{64}$/);
  });
});
