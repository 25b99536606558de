import { describe, expect, it } from "vitest";
import { deviceName } from "@/lib/device-name";
import { asSentence } from "@/lib/sentence";
import { refusalText, rolesAllowed, withArticle } from "@/lib/roles";

describe("device names for the account's sign-in list", () => {
  // User-agent strings in the form these browsers send them (cited from memory), read by bowser.
  it("names the browser, its major version and the system, in words", () => {
    expect(
      deviceName("Mozilla/5.0 (iPhone; CPU iPhone OS 17_4 like Mac OS X) AppleWebKit/605.1.15 (KHTML, like Gecko) Version/17.4 Mobile/15E148 Safari/604.1"),
    ).toBe("Safari 17 on an iPhone (iOS 17.4)");
    expect(deviceName("Mozilla/5.0 (Windows NT 10.0; Win64; x64; rv:128.0) Gecko/20100101 Firefox/128.0")).toBe("Firefox 128 on a Windows 10 computer");
    expect(deviceName("Mozilla/5.0 (Linux; Android 14; Pixel 8) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/124.0.0.0 Mobile Safari/537.36")).toBe(
      "Chrome 124 on an Android 14 phone",
    );
  });
  it("says 'Unknown browser' for no user agent or one no browser sends", () => {
    expect(deviceName(null)).toBe("Unknown browser");
    expect(deviceName("curl/8.5.0")).toBe("Unknown browser");
  });
});

describe("the words of a refusal", () => {
  it("names the roles an action needs and the person's own", () => {
    expect(rolesAllowed("kit.write")).toBe("riggers, leads and owners");
    expect(rolesAllowed("crew.invite")).toBe("owners");
    expect(withArticle("owner")).toBe("an owner");
    expect(refusalText("slip.write", "member", "Test Crew")).toBe(
      "Only riggers, leads and owners may record slip tests and their traces; you are a member of Test Crew.",
    );
  });
  it("ends text someone typed with one full stop", () => {
    expect(asSentence("Core shot")).toBe("Core shot.");
    expect(asSentence("Core shot.")).toBe("Core shot.");
    expect(asSentence("Lost?  ")).toBe("Lost?");
  });
});
