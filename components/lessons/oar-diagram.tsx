import { useId } from "react";
import { formatCm } from "@/components/lessons/lesson-format";
import { outboardCm } from "@/lib/rigging/geometry";

type OarKind = "scull" | "sweep";
type Dimension = "length" | "inboard" | "outboard";

export interface OarDiagramProps {
  kind: OarKind;
  /** Which dimension to emphasise (thicker arrow, bold label, shaded part of the oar). */
  highlight?: Dimension;
  /** Overall length shown on the drawing; defaults to a typical value for the kind. */
  lengthCm?: number;
  /** Inboard shown on the drawing; defaults to a typical value for the kind. */
  inboardCm?: number;
  /** Optional visible caption under the drawing. */
  caption?: string;
}

const TYPICAL: Record<OarKind, { lengthCm: number; inboardCm: number; gripUnits: number; bladeUnits: number }> = {
  // Typical settings for the drawing only; a club's own numbers come from its rigging sheet.
  scull: { lengthCm: 288, inboardCm: 88, gripUnits: 36, bladeUnits: 62 },
  sweep: { lengthCm: 374, inboardCm: 116, gripUnits: 60, bladeUnits: 70 },
};

// Drawing units; the viewBox is 360 wide so 15-unit text stays about 13 px on a 320 px screen.
const WIDTH = 360;
const HEIGHT = 240;
const X_HANDLE_END = 14;
const X_BLADE_TIP = 346;
const Y_OAR = 100;
const Y_INNER_DIMENSIONS = 174;
const Y_OVERALL_DIMENSION = 222;

function Arrow({ x1, x2, y, label, emphasised }: { x1: number; x2: number; y: number; label: string; emphasised: boolean }) {
  const head = emphasised ? 8 : 6;
  const half = emphasised ? 4.5 : 3.5;
  return (
    <g className={emphasised ? "text-river-700" : "text-slate-600"}>
      <line x1={x1 + head} x2={x2 - head} y1={y} y2={y} stroke="currentColor" strokeWidth={emphasised ? 3 : 1.5} />
      <polygon points={`${x1},${y} ${x1 + head},${y - half} ${x1 + head},${y + half}`} fill="currentColor" />
      <polygon points={`${x2},${y} ${x2 - head},${y - half} ${x2 - head},${y + half}`} fill="currentColor" />
      <text x={(x1 + x2) / 2} y={y - 8} textAnchor="middle" fontSize={14} fontWeight={emphasised ? 700 : 500} fill="currentColor">
        {label}
      </text>
    </g>
  );
}

function Leader({ x, y1, y2 }: { x: number; y1: number; y2: number }) {
  return <line x1={x} x2={x} y1={y1} y2={y2} stroke="currentColor" strokeWidth={1} />;
}

/** A labelled drawing of a scull or sweep oar with the overall length, inboard and outboard marked. */
export function OarDiagram({ kind, highlight, lengthCm, inboardCm, caption }: OarDiagramProps) {
  const id = useId();
  const typical = TYPICAL[kind];
  const length = lengthCm ?? typical.lengthCm;
  const inboard = inboardCm ?? typical.inboardCm;
  if (!(length > 0) || !(inboard > 0) || inboard >= length) {
    throw new Error(`OarDiagram: inboard (${inboard}) must be positive and shorter than the length (${length})`);
  }
  const outboard = outboardCm(length, inboard);

  const scale = (X_BLADE_TIP - X_HANDLE_END) / length;
  const xCollarFace = X_HANDLE_END + inboard * scale; // the blade-side face, where inboard is measured to
  const xGripEnd = X_HANDLE_END + typical.gripUnits;
  const xSleeveStart = xCollarFace - 16;
  const xSleeveEnd = xCollarFace + 40;
  const xNeck = X_BLADE_TIP - typical.bladeUnits;
  const y = Y_OAR;

  const oarName = kind === "scull" ? "scull" : "sweep oar";
  const titleId = `${id}-title`;
  const descId = `${id}-desc`;
  const highlightText = highlight
    ? ` The ${highlight === "length" ? "overall length" : highlight} is highlighted with a thicker arrow and bold label.`
    : "";

  const bladePath = [
    `M ${xNeck} ${y - 3.5}`,
    `C ${xNeck + 20} ${y - 6} ${xNeck + 36} ${y - 20} ${X_BLADE_TIP - 6} ${y - 20}`,
    `Q ${X_BLADE_TIP} ${y - 20} ${X_BLADE_TIP} ${y - 14}`,
    `L ${X_BLADE_TIP} ${y + 8}`,
    `Q ${X_BLADE_TIP} ${y + 14} ${X_BLADE_TIP - 8} ${y + 13}`,
    `C ${xNeck + 36} ${y + 10} ${xNeck + 20} ${y + 4} ${xNeck} ${y + 3.5}`,
    "Z",
  ].join(" ");

  const shadeX = highlight === "inboard" ? X_HANDLE_END : highlight === "outboard" ? xCollarFace : X_HANDLE_END;
  const shadeWidth =
    highlight === "inboard"
      ? xCollarFace - X_HANDLE_END
      : highlight === "outboard"
        ? X_BLADE_TIP - xCollarFace
        : X_BLADE_TIP - X_HANDLE_END;

  return (
    <figure className="my-6 rounded-lg border border-slate-300 bg-white p-3">
      <svg
        role="img"
        aria-labelledby={`${titleId} ${descId}`}
        viewBox={`0 0 ${WIDTH} ${HEIGHT}`}
        className="h-auto w-full max-w-xl"
        fontFamily="inherit"
      >
        <title id={titleId}>{`Parts and measurements of a ${oarName}`}</title>
        <desc id={descId}>
          {`The handle end is on the left and the blade tip on the right. Labelled parts: handle, handle end, sleeve, collar (button), shaft, blade and blade tip. ` +
            `Arrows show the overall length (${formatCm(length)} cm) from the handle end to the blade tip, ` +
            `the inboard (${formatCm(inboard)} cm) from the handle end to the blade-side face of the collar, ` +
            `and the outboard (${formatCm(outboard)} cm) from that face of the collar to the blade tip.${highlightText}`}
        </desc>

        {highlight ? (
          <rect
            x={shadeX}
            y={y - 26}
            width={shadeWidth}
            height={52}
            rx={6}
            className="fill-river-50 stroke-river-600"
            strokeDasharray="4 3"
          />
        ) : null}

        {/* The oar */}
        <g className="text-slate-800">
          <rect x={xGripEnd} y={y - 3.5} width={xNeck - xGripEnd} height={7} fill="currentColor" />
          <path d={bladePath} fill="currentColor" />
          <rect
            x={X_HANDLE_END}
            y={y - 7.5}
            width={typical.gripUnits}
            height={15}
            rx={5}
            className="fill-slate-400"
            stroke="currentColor"
            strokeWidth={1.5}
          />
          <rect
            x={xSleeveStart}
            y={y - 6.5}
            width={xSleeveEnd - xSleeveStart}
            height={13}
            rx={2}
            className="fill-slate-200"
            stroke="currentColor"
            strokeWidth={1.5}
          />
          <rect
            x={xCollarFace - 8}
            y={y - 12}
            width={8}
            height={24}
            rx={1.5}
            className="fill-amber-400"
            stroke="currentColor"
            strokeWidth={1.5}
          />
        </g>

        {/* Part labels with leader lines */}
        <g className="fill-slate-900 text-slate-500" fontSize={15}>
          <text x={X_HANDLE_END + typical.gripUnits / 2} y={22} textAnchor="middle">
            handle
          </text>
          <Leader x={X_HANDLE_END + typical.gripUnits / 2} y1={28} y2={y - 9} />
          <text x={(xSleeveEnd + xNeck) / 2} y={22} textAnchor="middle">
            shaft
          </text>
          <Leader x={(xSleeveEnd + xNeck) / 2} y1={28} y2={y - 5} />
          <text x={X_BLADE_TIP} y={22} textAnchor="end">
            blade tip
          </text>
          <Leader x={X_BLADE_TIP - 1} y1={28} y2={y - 16} />
          <text x={xCollarFace + 20} y={52} textAnchor="middle">
            sleeve
          </text>
          <Leader x={xCollarFace + 20} y1={58} y2={y - 8} />
          <text x={X_BLADE_TIP - 40} y={52} textAnchor="middle">
            blade
          </text>
          <Leader x={X_BLADE_TIP - 40} y1={58} y2={y - 19} />
          <text x={X_HANDLE_END + 6} y={140}>
            handle end
          </text>
          <text x={xCollarFace + 6} y={140}>
            collar (button)
          </text>
        </g>

        {/* Extension lines from the measured points */}
        <g className="text-slate-500" strokeDasharray="3 3">
          <Leader x={X_HANDLE_END} y1={y + 9} y2={Y_OVERALL_DIMENSION + 6} />
          <Leader x={xCollarFace} y1={y + 13} y2={Y_INNER_DIMENSIONS + 6} />
          <Leader x={X_BLADE_TIP} y1={y + 15} y2={Y_OVERALL_DIMENSION + 6} />
        </g>

        <Arrow
          x1={X_HANDLE_END}
          x2={xCollarFace}
          y={Y_INNER_DIMENSIONS}
          label={`inboard ${formatCm(inboard)} cm`}
          emphasised={highlight === "inboard"}
        />
        <Arrow
          x1={xCollarFace}
          x2={X_BLADE_TIP}
          y={Y_INNER_DIMENSIONS}
          label={`outboard ${formatCm(outboard)} cm`}
          emphasised={highlight === "outboard"}
        />
        <Arrow
          x1={X_HANDLE_END}
          x2={X_BLADE_TIP}
          y={Y_OVERALL_DIMENSION}
          label={`overall length ${formatCm(length)} cm`}
          emphasised={highlight === "length"}
        />
      </svg>
      {caption ? <figcaption className="mt-2 text-sm leading-6 text-slate-700">{caption}</figcaption> : null}
    </figure>
  );
}
