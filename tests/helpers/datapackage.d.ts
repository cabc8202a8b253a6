// The few parts of the Frictionless `datapackage` library (dev-only, no types of its own) the download tests use.
declare module "datapackage" {
  type Row = Record<string, unknown>;
  type Resource = { read(options: { keyed?: boolean; relations?: boolean; cast?: boolean }): Promise<Row[]> };
  export const Package: {
    load(
      descriptor: object,
      options: { basePath: string; strict: boolean },
    ): Promise<{ valid: boolean; errors: unknown[]; getResource(name: string): Resource | null }>;
  };
}
