"use client";

import { useEffect, useRef } from "react";
import { Table } from "@/components/ui/table";

type TableProps<Row> = Parameters<typeof Table<Row>>[0];

/**
 * The shared Table, with its sideways-scrolling frame reachable by keyboard: a wide table on a phone
 * must scroll with the arrow keys too, so the frame takes focus and is named after the table.
 */
export function KeyboardScrollTable<Row>(props: TableProps<Row>) {
  const ref = useRef<HTMLDivElement>(null);
  useEffect(() => {
    const frame = ref.current?.firstElementChild;
    if (!(frame instanceof HTMLElement)) return;
    frame.tabIndex = 0;
    frame.setAttribute("role", "region");
    frame.setAttribute("aria-label", `${props.caption}, scrolls sideways`);
  }, [props.caption]);
  return (
    <div ref={ref}>
      <Table {...props} />
    </div>
  );
}
