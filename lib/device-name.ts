import Bowser from "bowser";

const a = (word: string) => `${/^[aeiou]/i.test(word) ? "an" : "a"} ${word}`;

const PLATFORMS: Record<string, string> = { mobile: "phone", tablet: "tablet", desktop: "computer", tv: "TV" };

/**
 * What a signed-in device is, in words a person recognises, from the user-agent string its browser sent
 * (read by bowser): "Safari 17 on an iPhone (iOS 17.4)", "Firefox 128 on a Windows 10 computer". A string
 * no browser would send reads "Unknown browser".
 */
export function deviceName(userAgent: string | null): string {
  if (!userAgent) return "Unknown browser";
  const { browser, os, platform } = Bowser.parse(userAgent);
  if (!browser.name) return "Unknown browser";
  const major = browser.version?.split(".")[0];
  const name = major ? `${browser.name} ${major}` : browser.name;
  const system = os.name ? [os.name, os.versionName ?? os.version].filter(Boolean).join(" ") : null;
  if (platform.model) return `${name} on ${a(platform.model)}${system ? ` (${system})` : ""}`;
  const kind = platform.type ? PLATFORMS[platform.type] : undefined;
  if (system && kind) return `${name} on ${a(`${system} ${kind}`)}`;
  return system ? `${name} on ${system}` : name;
}
