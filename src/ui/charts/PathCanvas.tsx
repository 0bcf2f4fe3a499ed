import { useEffect, useRef } from 'react';
import { PALETTE, type FigureModel, type PathLayer } from '../../figures';

/** The sample paths drawn to a canvas under the SVG (used when they are too many for SVG). */
export function PathCanvas({ model, layer }: { readonly model: FigureModel; readonly layer: PathLayer }) {
  const ref = useRef<HTMLCanvasElement>(null);
  const { width, height } = model.size;
  useEffect(() => {
    const canvas = ref.current;
    const context = canvas?.getContext('2d');
    if (canvas === null || context === null || context === undefined) return;
    const ratio = window.devicePixelRatio || 1;
    canvas.width = Math.round(width * ratio);
    canvas.height = Math.round(height * ratio);
    context.setTransform(ratio, 0, 0, ratio, 0, 0);
    context.clearRect(0, 0, width, height);
    context.save();
    context.beginPath();
    context.rect(model.plot.left, model.plot.top, model.plot.width, model.plot.height);
    context.clip();
    context.strokeStyle = PALETTE[layer.style.colour];
    context.lineWidth = layer.style.width;
    context.globalAlpha = 0.7;
    for (const d of layer.paths) if (d !== '') context.stroke(new Path2D(d));
    context.restore();
  }, [layer, width, height, model.plot]);
  return <canvas ref={ref} className="chart-canvas" style={{ width, height }} aria-hidden="true" data-testid="paths-canvas" />;
}
