// @ts-nocheck
"use client";
// The sheet's parts list as a table: description, price each, quantity, amount, and the total.
import type { useFieldArray, UseFormReturn } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { HeadCells, TotalFoot } from "@/components/ui/data-table";
import { usePrice } from "@/components/price";
import type { FormIn, FormOut } from "./use-recommendation-form";
import { FieldError } from "@/components/ui/field";

export type LineField = "description" | "unitPrice" | "quantity" | "partNumber";

type PartsTableProps = {
  form: UseFormReturn<FormIn, unknown, FormOut>;
  lines: ReturnType<typeof useFieldArray<FormIn, "parts">>;
  watched: NonNullable<FormIn["parts"]>;
  amounts: (string | null)[];
  total: string | null;
  lineError: (i: number, k: LineField) => string | undefined;
};

export function PartsTable({ form, lines, watched, amounts, total, lineError }: PartsTableProps) {
  const price = usePrice();
  return (
    <table className="w-full text-sm">
      <caption className="sr-only">Parts list</caption>
      <thead>
        <tr className="border-b border-line text-left">
          <HeadCells
            cell="py-1 font-medium"
            columns={[
              "Description",
              { label: "Each", className: "w-32 py-1 text-right font-medium" },
              { label: "Qty", className: "w-24 py-1 text-right font-medium" },
              { label: "Amount", className: "w-28 py-1 text-right font-medium" },
              { label: <span className="sr-only">Remove</span>, key: "remove", className: "w-20 py-1" },
            ]}
          />
        </tr>
      </thead>
      <tbody>
        {lines.fields.map((f, i) => {
          const fromShelf = !!watched[i]?.partNumber;
          return (
            <tr key={f.id} className="border-b border-line align-top">
              <td className="py-1 pr-2">
                <label htmlFor={`line-${i}-description`} className="sr-only">
                  Description of line {i + 1}
                </label>
                <input
                  id={`line-${i}-description`}
                  readOnly={fromShelf}
                  {...form.register(`parts.${i}.description`)}
                  aria-invalid={lineError(i, "description") ? true : undefined}
                  aria-describedby={lineError(i, "description") ? `line-${i}-description-error` : undefined}
                  placeholder="e.g. Belt, 8-rib"
                  className="w-full rounded-md border border-line bg-panel px-2 py-1 read-only:border-transparent read-only:bg-transparent"
                />
                {fromShelf ? <span className="text-xs text-muted">{watched[i]?.partNumber} · shelf price</span> : null}
                <FieldError id={`line-${i}-description-error`}>{lineError(i, "description") || lineError(i, "partNumber")}</FieldError>
              </td>
              <td className="py-1 pr-2 text-right">
                <label htmlFor={`line-${i}-price`} className="sr-only">
                  Price each, line {i + 1}
                </label>
                <input
                  id={`line-${i}-price`}
                  readOnly={fromShelf}
                  inputMode="decimal"
                  {...form.register(`parts.${i}.unitPrice`)}
                  aria-invalid={lineError(i, "unitPrice") ? true : undefined}
                  aria-describedby={lineError(i, "unitPrice") ? `line-${i}-price-error` : undefined}
                  className="w-full rounded-md border border-line bg-panel px-2 py-1 text-right read-only:border-transparent read-only:bg-transparent"
                />
                <FieldError id={`line-${i}-price-error`}>{lineError(i, "unitPrice")}</FieldError>
              </td>
              <td className="py-1 pr-2 text-right">
                <label htmlFor={`line-${i}-quantity`} className="sr-only">
                  Quantity, line {i + 1}
                </label>
                <input
                  id={`line-${i}-quantity`}
                  inputMode="numeric"
                  {...form.register(`parts.${i}.quantity`)}
                  aria-invalid={lineError(i, "quantity") ? true : undefined}
                  aria-describedby={lineError(i, "quantity") ? `line-${i}-quantity-error` : undefined}
                  className="w-full rounded-md border border-line bg-panel px-2 py-1 text-right"
                />
                <FieldError id={`line-${i}-quantity-error`}>{lineError(i, "quantity")}</FieldError>
              </td>
              <td className="py-1 text-right num">{amounts[i] == null ? "–" : price(amounts[i]!)}</td>
              <td className="py-1 text-right">
                <Button type="button" variant="ghost" onClick={() => lines.remove(i)} aria-label={`Remove line ${i + 1}`}>
                  Remove
                </Button>
              </td>
            </tr>
          );
        })}
      </tbody>
      <TotalFoot labelSpan={3} testId="form-total" trailing={1}>
        {total === null ? "–" : price(total)}
      </TotalFoot>
    </table>
  );
}
