/** A site-check input that cannot be computed. `field` names the offending input path,
 * e.g. "layers[2].thickness_mm", so a form can put the message beside the right box. */
export class SiteCheckInputError extends Error {
  readonly field: string;
  constructor(field: string, message: string) {
    super(`${field}: ${message}`);
    this.name = "SiteCheckInputError";
    this.field = field;
  }
}

/** A material library entry that the engine cannot use (missing value, bad curve). */
export class MaterialDataError extends Error {
  readonly slug: string;
  constructor(slug: string, message: string) {
    super(`material "${slug}": ${message}`);
    this.name = "MaterialDataError";
    this.slug = slug;
  }
}
