// Debian's Chromium for browser tests; installed with apt-get when missing and we are root.
import { existsSync } from "node:fs";
import { spawnSync } from "node:child_process";

export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";

export function ensureChromium(log: (m: string) => void = console.log): boolean {
  if (existsSync(CHROMIUM_PATH)) return true;
  if (typeof process.getuid !== "function" || process.getuid() !== 0) {
    log(`Chromium is missing at ${CHROMIUM_PATH}: install it with \`sudo apt-get install -y chromium\`.`);
    return false;
  }
  log("[e2e] installing Debian's chromium…");
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  spawnSync("apt-get", ["update", "-qq"], { stdio: "inherit", env });
  spawnSync("apt-get", ["install", "-y", "-qq", "chromium"], { stdio: "inherit", env });
  return existsSync(CHROMIUM_PATH);
}

export const CHROMIUM_ARGS = ["--no-sandbox", "--disable-dev-shm-usage", "--disable-background-networking", "--disable-gpu",
  "--disable-quic", "--no-first-run", "--disable-component-update", "--disable-sync"];
