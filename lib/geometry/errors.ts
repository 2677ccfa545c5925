/** A geometric problem with a description, located so a person can find and fix it. */
export interface GeometryIssue {
  /** Dotted path of the field at fault, e.g. "bents.2.station". */
  path: string;
  /** A sentence naming span, girder, point or field and what is wrong. */
  message: string;
  span?: number;
  girder?: string;
  point?: number;
}

/** Thrown by computeOffsetTable when the description cannot describe a buildable deck. */
export class GeometryError extends Error {
  readonly issues: GeometryIssue[];

  constructor(issues: GeometryIssue[]) {
    const more = issues.length > 1 ? ` (and ${issues.length - 1} more problem${issues.length > 2 ? 's' : ''})` : '';
    super(issues.length > 0 ? `${issues[0].message}${more}` : 'The bridge geometry is not valid');
    this.name = 'GeometryError';
    this.issues = issues;
  }
}
