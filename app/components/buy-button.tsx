import { getFormProps, useForm } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { Form } from "react-router";
import { checkoutFormSchema } from "~/payments/checkout-form";
import type { EntitlementKind } from "~/vocabulary/entitlements";
import { CsrfField } from "./csrf-field";

/**
 * Posts to the checkout action on /pricing, which answers with a redirect to the hosted checkout page.
 * A full document submission, because the next page lives on the payments service's own site.
 */
export function BuyButton({
  kind,
  item,
  label,
  testId,
}: {
  kind: EntitlementKind;
  item: string;
  label: string;
  testId?: string;
}) {
  const [form] = useForm({ onValidate: ({ formData }) => parseWithZod(formData, { schema: checkoutFormSchema }) });
  return (
    <Form method="post" action="/pricing" reloadDocument {...getFormProps(form)}>
      <CsrfField />
      <input type="hidden" name="kind" value={kind} />
      <input type="hidden" name={kind} value={item} />
      <button
        type="submit"
        data-testid={testId}
        className="rounded bg-ochre px-4 py-2 font-semibold text-sheet hover:bg-ochre-deep"
      >
        {label}
      </button>
    </Form>
  );
}
