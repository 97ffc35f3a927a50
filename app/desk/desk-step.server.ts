// One way for desk actions to answer an expected refusal (a DeskError): as the form's error or as
// JSON, with the refusal's status. Anything else is a fault and propagates to the error boundary.
import { data } from "react-router";
import { jsonError } from "~/http/json";
import { DeskError } from "./revisions.server";

/** Runs one desk step of an action; a DeskError becomes the action's answer through `refused`. */
export async function deskStep<T, R>(work: () => Promise<T>, refused: (error: DeskError) => R): Promise<T | R> {
  try {
    return await work();
  } catch (error) {
    if (error instanceof DeskError) return refused(error);
    throw error;
  }
}

/** The refusal as a conform form's answer: the message as the form's own error. */
export function refusedForm<R>(submission: { reply(options: { formErrors: string[] }): R }) {
  return (error: DeskError) =>
    data({ result: submission.reply({ formErrors: [error.message] }) }, { status: error.status });
}

/** The refusal as a JSON answer, for the desk's fetch endpoints. */
export function refusedJson(error: DeskError): Response {
  return jsonError(error.status, "refused", error.message);
}
