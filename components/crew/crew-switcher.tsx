"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { classNames } from "@/lib/class-names";
import { controlClasses } from "@/components/ui/field";
import { callApi } from "@/components/forms/call-api";

interface CrewOption {
  id: string;
  name: string;
}

/** Chooses the crew every page works in; the server checks membership on every request anyway. */
export function CrewSwitcher({ crews, currentId }: { crews: CrewOption[]; currentId: string }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  async function choose(crewId: string) {
    setBusy(true);
    await callApi("POST", "/api/crews/current", { crewId });
    setBusy(false);
    router.refresh();
  }
  return (
    <div>
      <label htmlFor="crew-switcher" className="sr-only">
        Crew
      </label>
      <select id="crew-switcher" className={classNames(controlClasses, "text-sm")} value={currentId} disabled={busy} onChange={(e) => choose(e.target.value)}>
        {crews.map((crew) => (
          <option key={crew.id} value={crew.id}>
            {crew.name}
          </option>
        ))}
      </select>
    </div>
  );
}
