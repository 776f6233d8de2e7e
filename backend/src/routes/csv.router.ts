import { idParamsSchema } from '../../../shared/src/schemas/common.schema.js';
import { assemblyExportQuerySchema, IMPORT_LIMITS, importTemplateParamsSchema, importUploadSchema } from '../../../shared/src/schemas/csv.schema.js';
import { streamAssemblyExport } from '../services/csv-export.service.js';
import { getImport, importTemplate, listImports, startImport, writeImport } from '../services/csv-import.service.js';
import type { RouteDef } from './route.js';

/** CSV in and out: the register's export, and imports of constructions, positions and assemblies. */
export const csvRoutes: RouteDef[] = [
  // Before /assemblies/:id, which would otherwise take "export" for an id.
  {
    method: 'get',
    path: '/assemblies/export',
    action: 'register.export',
    schemas: { query: assemblyExportQuerySchema },
    async handler({ ctx, res, actor, query }) {
      await streamAssemblyExport(ctx, actor, query, res);
    },
  },
  {
    method: 'get',
    path: '/imports',
    action: 'imports.run',
    async handler({ ctx, res, actor }) {
      res.json({ data: await listImports(ctx, actor) });
    },
  },
  {
    method: 'get',
    path: '/imports/templates/:kind',
    action: 'imports.run',
    schemas: { params: importTemplateParamsSchema },
    handler({ res, params }) {
      res
        .status(200)
        .set({ 'Content-Type': 'text/csv; charset=utf-8', 'Content-Disposition': `attachment; filename="ferrule-${params.kind}-template.csv"` })
        .send(importTemplate(params.kind));
    },
  },
  {
    method: 'post',
    path: '/imports',
    action: 'imports.run',
    upload: { field: 'file', maxBytes: IMPORT_LIMITS.maxBytes },
    schemas: { body: importUploadSchema },
    async handler({ ctx, req, res, actor, body }) {
      res.status(202).json({ data: await startImport(ctx, actor, body, req.file) });
    },
  },
  {
    method: 'get',
    path: '/imports/:id',
    action: 'imports.run',
    schemas: { params: idParamsSchema },
    async handler({ ctx, res, actor, params }) {
      res.json({ data: await getImport(ctx, actor, params.id) });
    },
  },
  {
    method: 'post',
    path: '/imports/:id/write',
    action: 'imports.run',
    schemas: { params: idParamsSchema },
    async handler({ ctx, res, actor, params }) {
      res.status(202).json({ data: await writeImport(ctx, actor, params.id) });
    },
  },
];
