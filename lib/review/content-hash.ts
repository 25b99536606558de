import canonicalize from "canonicalize";
import { sha256Hex } from "@/lib/sha256";

/** What a sign-off vouches for: the inputs as evaluated, the result and the engine that made it. */
export interface SignedContent {
  inputs: Record<string, unknown>;
  result: unknown;
  engineVersion: string;
}

/** SHA-256 (hex) over the RFC 8785 canonical JSON of the signed content: the same bytes whatever the key order. */
export function contentHash(content: SignedContent): string {
  return sha256Hex(canonicalize({ inputs: content.inputs, result: content.result, engineVersion: content.engineVersion })!);
}
