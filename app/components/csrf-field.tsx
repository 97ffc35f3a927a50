import { useRootData } from "./root-data";

/** The hidden CSRF token every state-changing form carries; checked by requireCsrf() in the action. */
export function CsrfField() {
  return <input type="hidden" name="csrf" value={useRootData()?.csrfToken ?? ""} />;
}
