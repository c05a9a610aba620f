"use client";

// Fret positions from a ComputeResult, on TanStack Table v9, with copy to the clipboard and a CSV
// download. Takes the result as a prop, so any screen that computes a spec can show it. The CSV
// writer (with the Buffer shim it brings) loads on the first download, not with the page.
import { createColumnHelper, tableFeatures, useTable, type ColumnDef } from "@tanstack/react-table";
import { useMemo } from "react";
import { Button } from "@/components/ui/button";
import { Table, TBody, Td, Th, THead } from "@/components/ui/table";
import { useToast } from "@/components/ui/toast";
import type { ComputeResult, FretRow } from "@/lib/schemas/instrument-spec";
import { fretColumns, fretTableText } from "./fret-columns";

const features = tableFeatures({});
const helper = createColumnHelper<typeof features, FretRow>();

export interface FretTableProps {
  result: Pick<ComputeResult, "units" | "scale" | "frets">;
  /** File name of the CSV download, without extension. */
  fileName?: string;
}

export function FretTable({ result, fileName = "fret-positions" }: FretTableProps) {
  const toast = useToast();
  const specCols = useMemo(() => fretColumns(result), [result]);
  // Built from the shared column list; `any` as TanStack's own helper.columns() types a mixed list.
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  const columns = useMemo<ColumnDef<typeof features, FretRow, any>[]>(
    () =>
      specCols.map((c) =>
        helper.accessor((row) => c.value(row), { id: c.id, header: c.header, cell: (info) => c.text(info.getValue()) }),
      ),
    [specCols],
  );
  const table = useTable({ features, columns, data: result.frets });

  const copy = async () => {
    const text = fretTableText(result).map((r) => r.join("\t")).join("\n");
    try {
      await navigator.clipboard.writeText(text);
      toast.show("Fret table copied: paste it into a spreadsheet.", "success");
    } catch {
      toast.show("The browser did not allow copying; use the CSV download instead.", "error");
    }
  };

  const download = async () => {
    let csv: string;
    try {
      const { stringify } = await import("csv-stringify/browser/esm/sync");
      csv = stringify(fretTableText(result));
    } catch {
      toast.show("The CSV download could not load; check the connection and try again.", "error");
      return;
    }
    const url = URL.createObjectURL(new Blob([csv], { type: "text/csv;charset=utf-8" }));
    const a = document.createElement("a");
    a.href = url;
    a.download = `${fileName}.csv`;
    document.body.append(a);
    a.click();
    a.remove();
    setTimeout(() => URL.revokeObjectURL(url), 1000);
  };

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap gap-2">
        <Button variant="secondary" size="sm" onClick={copy}>
          Copy table
        </Button>
        <Button variant="secondary" size="sm" onClick={download}>
          Download CSV
        </Button>
      </div>
      <Table caption={`Fret positions in ${result.units}`}>
        <THead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => (
                <Th key={header.id} className={header.column.id === "n" ? undefined : "text-right"}>
                  {header.isPlaceholder ? null : <table.FlexRender header={header} />}
                </Th>
              ))}
            </tr>
          ))}
        </THead>
        <TBody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className={row.original.n === 12 || row.original.n === 24 ? "bg-brass-50" : undefined}>
              {row.getAllCells().map((cell) => (
                <Td key={cell.id} numeric={cell.column.id !== "n"} className={cell.column.id === "n" ? "font-mono" : undefined}>
                  <table.FlexRender cell={cell} />
                </Td>
              ))}
            </tr>
          ))}
        </TBody>
      </Table>
    </div>
  );
}
