import type { Migration } from "../migrator.ts";
import { accounts } from "./2026-12-02-0001-accounts.ts";
import { catalogue } from "./2026-12-02-0002-catalogue.ts";
import { entitlements } from "./2026-12-02-0003-entitlements.ts";
import { payments } from "./2026-12-02-0004-payments.ts";
import { uploads } from "./2026-12-03-0005-uploads.ts";
import { catalogueFacetIndex } from "./2026-12-03-0006-catalogue-facet-index.ts";

// Applied in this order; append new migrations at the end.
export const migrations: Migration[] = [accounts, catalogue, entitlements, payments, uploads, catalogueFacetIndex];
