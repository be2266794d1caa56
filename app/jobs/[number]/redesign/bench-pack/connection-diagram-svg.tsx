/** The connection diagram's shapes (lib/bench-pack/connection-diagram.ts) as an inline SVG for the print view. */
import type { Diagram, Shape } from '@/lib/bench-pack/connection-diagram';

function SvgShape({ shape }: { shape: Shape }) {
  switch (shape.kind) {
    case 'line':
      return (
        <line
          x1={shape.x1}
          y1={shape.y1}
          x2={shape.x2}
          y2={shape.y2}
          stroke="currentColor"
          strokeWidth={shape.width}
          {...(shape.dashed ? { strokeDasharray: '4 3' } : {})}
        />
      );
    case 'rect':
      return <rect x={shape.x} y={shape.y} width={shape.w} height={shape.h} stroke="currentColor" strokeWidth={shape.width} fill="white" />;
    case 'circle':
      return (
        <circle
          cx={shape.cx}
          cy={shape.cy}
          r={shape.r}
          stroke="currentColor"
          strokeWidth={1.2}
          fill={shape.filled ? 'currentColor' : 'white'}
        />
      );
    case 'arrow': {
      const dir = shape.x2 > shape.x1 ? 1 : -1;
      return (
        <g>
          <line x1={shape.x1} y1={shape.y} x2={shape.x2 - dir * 7} y2={shape.y} stroke="currentColor" strokeWidth={1.8} />
          <polygon
            points={`${shape.x2},${shape.y} ${shape.x2 - dir * 8},${shape.y - 4} ${shape.x2 - dir * 8},${shape.y + 4}`}
            fill="currentColor"
          />
        </g>
      );
    }
    case 'text':
      return (
        <text
          x={shape.x}
          y={shape.y}
          fontSize={shape.size}
          textAnchor={shape.anchor}
          fontWeight={shape.bold ? 700 : 400}
          fill="currentColor"
        >
          {shape.text}
        </text>
      );
  }
}

export function ConnectionDiagramSvg({ diagram, title }: { diagram: Diagram; title: string }) {
  return (
    <svg className="bench-diagram" viewBox={`0 0 ${diagram.width} ${diagram.height}`} role="img" aria-label={title} width="100%">
      <title>{title}</title>
      {diagram.shapes.map((s, i) => (
        <SvgShape key={i} shape={s} />
      ))}
    </svg>
  );
}
