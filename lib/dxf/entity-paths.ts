// The drawable geometry of one DXF entity as open or closed point paths in the drawing's units:
// LINE, LWPOLYLINE and POLYLINE (with bulges), ARC, CIRCLE, ELLIPSE and SPLINE (through its fit
// points, else its control points: an outline, not the exact curve). Words (TEXT, MTEXT), dimensions,
// hatches and points are not drawn. INSERT is handled by the caller (normalise.ts).
import type { IArcEntity, ICircleEntity, IEllipseEntity, IEntity, ILineEntity, ILwpolylineEntity, IPolylineEntity, ISplineEntity } from 'dxf-parser';
import { arcPoints, bulgePoints, circlePoints, ellipsePoints, type Point } from './flatten';

export const DRAWN_ENTITY_TYPES = ['LINE', 'LWPOLYLINE', 'POLYLINE', 'ARC', 'CIRCLE', 'ELLIPSE', 'SPLINE'] as const;

function finite(point: { x?: number; y?: number } | undefined): point is Point {
  return point !== undefined && Number.isFinite(point.x) && Number.isFinite(point.y);
}

/** Vertices with bulges (group 42) joined by straight pieces or arcs; closed adds the piece back to the first. */
function bulgedPath(vertices: { x: number; y: number; bulge?: number }[], closed: boolean): Point[] {
  const points: { x: number; y: number; bulge?: number }[] = vertices.filter(finite);
  if (points.length < 2) return [];
  const path: Point[] = [{ x: points[0]!.x, y: points[0]!.y }];
  const count = closed ? points.length : points.length - 1;
  for (let index = 0; index < count; index += 1) {
    const from = points[index]!;
    const to = points[(index + 1) % points.length]!;
    const piece = from.bulge ? bulgePoints(from, to, from.bulge) : [from, to];
    for (const point of piece.slice(1)) path.push({ x: point.x, y: point.y });
  }
  return path;
}

/** An entity whose extrusion direction is (0, 0, −1) is drawn mirrored in x (its object coordinate system, AutoCAD DXF Reference "Arbitrary Axis Algorithm"). */
function mirroredIfFlipped(path: Point[], extrusionZ: number | undefined): Point[] {
  return extrusionZ !== undefined && extrusionZ < 0 ? path.map((point) => ({ x: -point.x, y: point.y })) : path;
}

/** The entity's paths, or null when its type is not one the plan draws. */
export function entityPaths(entity: IEntity): Point[][] | null {
  switch (entity.type) {
    case 'LINE': {
      const [from, to] = (entity as ILineEntity).vertices ?? [];
      return finite(from) && finite(to) ? [[{ x: from.x, y: from.y }, { x: to.x, y: to.y }]] : [];
    }
    case 'LWPOLYLINE': {
      const polyline = entity as ILwpolylineEntity;
      return [mirroredIfFlipped(bulgedPath(polyline.vertices ?? [], Boolean(polyline.shape)), polyline.extrusionDirectionZ)];
    }
    case 'POLYLINE': {
      const polyline = entity as IPolylineEntity;
      if (polyline.isPolyfaceMesh || polyline.is3dPolygonMesh) return [];
      return [bulgedPath(polyline.vertices ?? [], Boolean(polyline.shape))];
    }
    case 'ARC': {
      const arc = entity as IArcEntity;
      if (!finite(arc.center) || !(arc.radius > 0)) return [];
      return [mirroredIfFlipped(arcPoints(arc.center, arc.radius, arc.startAngle ?? 0, arc.endAngle ?? 2 * Math.PI), arc.extrusionDirectionZ)];
    }
    case 'CIRCLE': {
      const circle = entity as ICircleEntity;
      return finite(circle.center) && circle.radius > 0 ? [circlePoints(circle.center, circle.radius)] : [];
    }
    case 'ELLIPSE': {
      const ellipse = entity as IEllipseEntity;
      if (!finite(ellipse.center) || !finite(ellipse.majorAxisEndPoint) || !(ellipse.axisRatio > 0)) return [];
      return [ellipsePoints(ellipse.center, ellipse.majorAxisEndPoint, ellipse.axisRatio, ellipse.startAngle ?? 0, ellipse.endAngle ?? 2 * Math.PI)];
    }
    case 'SPLINE': {
      const spline = entity as ISplineEntity;
      const points = (spline.fitPoints?.length ? spline.fitPoints : spline.controlPoints ?? []).filter(finite).map((point) => ({ x: point.x, y: point.y }));
      if (spline.closed && points.length > 2) points.push(points[0]!);
      return [points];
    }
    default:
      return null;
  }
}
