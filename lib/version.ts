import manifest from "@/package.json";

export const APP_VERSION: string = manifest.version;
