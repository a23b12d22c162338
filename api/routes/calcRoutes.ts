import type { OpenAPIHono } from '@hono/zod-openapi';
import { calculateEdgeStress } from '../calc/calculateEdgeStress.ts';
import { calculateFringeOrder } from '../calc/calculateFringeOrder.ts';
import { calculateFringeValue } from '../calc/calculateFringeValue.ts';
import { calculateStageAnalysis } from '../calc/calculateStageAnalysis.ts';
import type { AppEnv } from '../AppEnv.ts';
import { EdgeStressCalcResultSchema, FringeOrderCalcResultSchema, FringeValueCalcResultSchema } from '../schemas/calcResultSchemas.ts';
import { EdgeStressCalcInputSchema, FringeOrderCalcInputSchema, FringeValueCalcInputSchema, StageAnalysisCalcInputSchema } from '../schemas/calcSchemas.ts';
import { StageAnalysisCalcResultSchema } from '../schemas/stageAnalysisResultSchema.ts';
import { jsonBody, jsonResponse } from './routeParts.ts';
import { secureRoute } from './secureRoute.ts';

const tags = ['Calculators'];

// Stateless: nothing is read or stored, so any key of the lab may use them.
export function calcRoutes(app: OpenAPIHono<AppEnv>): void {
  app.openapi(
    secureRoute('viewer', { method: 'post', path: '/v1/calc/fringe-order', tags, summary: 'Fringe order, its uncertainty and the retardation from one reading\'s raw inputs', request: { body: jsonBody(FringeOrderCalcInputSchema) }, responses: { 200: jsonResponse(FringeOrderCalcResultSchema, 'The fringe order') } }),
    (c) => c.json(calculateFringeOrder(c.req.valid('json')), 200),
  );
  app.openapi(
    secureRoute('viewer', { method: 'post', path: '/v1/calc/edge-stress', tags, summary: 'Stress-optic law N·fσ/t with uncertainty: edge stress at a free edge, else σ1 − σ2', request: { body: jsonBody(EdgeStressCalcInputSchema) }, responses: { 200: jsonResponse(EdgeStressCalcResultSchema, 'The stress') } }),
    (c) => c.json(calculateEdgeStress(c.req.valid('json')), 200),
  );
  app.openapi(
    secureRoute('viewer', { method: 'post', path: '/v1/calc/stage-analysis', tags, summary: 'Every stage quantity at one site, and fitness to test of the residual the model carries now', request: { body: jsonBody(StageAnalysisCalcInputSchema) }, responses: { 200: jsonResponse(StageAnalysisCalcResultSchema, 'The stage analysis and fitness decision') } }),
    (c) => c.json(calculateStageAnalysis(c.req.valid('json')), 200),
  );
  app.openapi(
    secureRoute('viewer', { method: 'post', path: '/v1/calc/fringe-value', tags, summary: 'Material fringe value from a calibration specimen, or a fit through the origin over several', request: { body: jsonBody(FringeValueCalcInputSchema) }, responses: { 200: jsonResponse(FringeValueCalcResultSchema, 'The fringe value at the calibration wavelength') } }),
    (c) => c.json(calculateFringeValue(c.req.valid('json')), 200),
  );
}
