import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { download, figureToSvg, svgToPng } from '../geometry/export-image';
import { pointsToCsv } from '../geometry/points-csv';
import type { MapPoint } from '../geometry/types';

/** Save the figure as SVG or PNG, and its points as CSV. */
export function MapExports({ svg, canvas, points, yLabel, displayY, fileStem }: { svg: SVGSVGElement | null; canvas: HTMLCanvasElement | null; points: MapPoint[]; yLabel: string; displayY: (y: number) => number; fileStem: string }) {
  const [error, setError] = useState<string | null>(null);
  const svgText = () => (svg ? figureToSvg(svg, canvas) : '');
  return (
    <div className="flex flex-wrap items-center gap-2" role="group" aria-label="Export">
      <Button size="sm" variant="secondary" disabled={!svg} onClick={() => download(`${fileStem}.svg`, new Blob([svgText()], { type: 'image/svg+xml' }))}>
        Save SVG
      </Button>
      <Button
        size="sm"
        variant="secondary"
        disabled={!svg}
        onClick={async () => {
          setError(null);
          try {
            download(`${fileStem}.png`, await svgToPng(svgText(), svg!.clientWidth, svg!.clientHeight));
          } catch (e) {
            setError((e as Error).message);
          }
        }}
      >
        Save PNG
      </Button>
      <Button size="sm" variant="secondary" onClick={() => download(`${fileStem}-points.csv`, new Blob([pointsToCsv(points.map((p) => ({ ...p, y: displayY(p.y) })), yLabel)], { type: 'text/csv' }))}>
        Points as CSV
      </Button>
      {error && <Notice tone="error">{error}</Notice>}
    </div>
  );
}
