import type { ReactElement } from "react";

/** A panel-coloured outline behind a label's letters, so a line passing under it never makes it hard to read. */
export const halo = { stroke: "rgb(var(--gb-panel))", strokeWidth: 3, paintOrder: "stroke" } as const;

interface PointLabelProps {
  x?: number | string;
  y?: number | string;
  index?: number;
}

/** A line's name written once beside the point at `index`, so every line says what it is without a legend to match colours against. */
export function lineLabel(text: string, color: string, index: number, anchor: "start" | "middle" | "end" = "end") {
  return function Label(props: PointLabelProps): ReactElement<SVGElement> {
    if (props.index !== index) return <g />;
    return (
      <text x={Number(props.x)} y={Number(props.y) - 7} textAnchor={anchor} fill={color} fontSize={13} fontWeight={700} {...halo}>
        {text}
      </text>
    );
  };
}

/** The name at the last point still inside the plot (below `yMax`). */
export function endLabel(text: string, color: string, values: readonly number[], yMax: number) {
  let at = values.length - 1;
  while (at > 0 && values[at] > yMax * 0.92) at--;
  return lineLabel(text, color, at);
}
