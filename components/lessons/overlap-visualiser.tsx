"use client";

import { useId, useState } from "react";
import { overlapCm, simpleOverlapCm } from "@/lib/rigging/geometry";
import { formatCm, formatSignedCm, parseCmInput } from "@/components/lessons/lesson-format";
import { useHydrated } from "@/components/ui/use-hydrated";

export interface OverlapVisualiserProps {
  defaultSpanCm?: number;
  defaultInboardCm?: number;
  /** Half the swivel width in the protocol's overlap; a club setting, 2 cm unless the club says otherwise. */
  halfSwivelCm?: number;
}

const SPAN_RANGE = { min: 145, max: 175 };
const INBOARD_RANGE = { min: 80, max: 96 };
const STEP_CM = 0.5;

// Top view drawn to one fixed scale so moving a slider visibly moves the handles.
const WIDTH = 360;
const HEIGHT = 220;
const CENTRE_X = WIDTH / 2;
const UNITS_PER_CM = 1.9;
const Y_RIGGER = 112;
const Y_LEFT_SCULL = 100;
const Y_RIGHT_SCULL = 124;
const Y_OVERLAP = 150;
const Y_SPAN = 202;
const GRIP_CM = 12;
const HULL_HALF_WIDTH = 28;

type Field = "span" | "inboard";

function hullPath(): string {
  const w = HULL_HALF_WIDTH;
  const c = CENTRE_X;
  return [
    `M ${c} 18`,
    `C ${c + w * 0.9} 60 ${c + w} 85 ${c + w} ${Y_RIGGER}`,
    `C ${c + w} 140 ${c + w * 0.9} 165 ${c} 206`,
    `C ${c - w * 0.9} 165 ${c - w} 140 ${c - w} ${Y_RIGGER}`,
    `C ${c - w} 85 ${c - w * 0.9} 60 ${c} 18`,
    "Z",
  ].join(" ");
}

// A white outline behind text keeps labels readable where they cross the hull or the centre line.
const HALO = { paintOrder: "stroke", stroke: "white", strokeWidth: 4, strokeLinejoin: "round" } as const;

function NumberField({
  id,
  label,
  range,
  value,
  text,
  error,
  disabled,
  onSlide,
  onType,
}: {
  id: string;
  label: string;
  range: { min: number; max: number };
  value: number;
  text: string;
  error: string | undefined;
  disabled: boolean;
  onSlide: (value: number) => void;
  onType: (text: string) => void;
}) {
  return (
    <div>
      <label htmlFor={`${id}-text`} className="block text-sm font-semibold text-slate-900">
        {label} (cm)
      </label>
      <div className="mt-1 flex items-center gap-3">
        <input
          type="range"
          aria-label={`${label} slider`}
          min={range.min}
          max={range.max}
          step={STEP_CM}
          value={Math.min(range.max, Math.max(range.min, value))}
          disabled={disabled}
          onChange={(event) => onSlide(Number(event.target.value))}
          className="h-11 min-w-0 flex-1 accent-river-600"
        />
        <input
          id={`${id}-text`}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          value={text}
          disabled={disabled}
          onChange={(event) => onType(event.target.value)}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          className="block min-h-11 w-20 rounded-md border border-slate-500 bg-white px-2 text-base text-slate-900 aria-invalid:border-alarm-600 aria-invalid:ring-2 aria-invalid:ring-alarm-600 disabled:bg-slate-100"
        />
      </div>
      {error ? (
        <p id={`${id}-error`} className="mt-1 text-sm text-alarm-800">
          <span className="font-semibold">Check this: </span>
          {error}
        </p>
      ) : null}
    </div>
  );
}

/** Shows a pair of sculls crossing over the boat's centre line and the overlap a span and inboard give. */
export function OverlapVisualiser({ defaultSpanCm = 159, defaultInboardCm = 88, halfSwivelCm = 2 }: OverlapVisualiserProps) {
  const id = useId();
  const hydrated = useHydrated();
  const [values, setValues] = useState({ span: defaultSpanCm, inboard: defaultInboardCm });
  const [texts, setTexts] = useState({ span: formatCm(defaultSpanCm), inboard: formatCm(defaultInboardCm) });
  const [errors, setErrors] = useState<Partial<Record<Field, string>>>({});

  const ranges: Record<Field, { min: number; max: number }> = { span: SPAN_RANGE, inboard: INBOARD_RANGE };

  function slide(field: Field, value: number) {
    setValues((previous) => ({ ...previous, [field]: value }));
    setTexts((previous) => ({ ...previous, [field]: formatCm(value) }));
    setErrors((previous) => ({ ...previous, [field]: undefined }));
  }

  function typeIn(field: Field, text: string) {
    setTexts((previous) => ({ ...previous, [field]: text }));
    const value = parseCmInput(text);
    const range = ranges[field];
    if (value === null || value < range.min || value > range.max) {
      setErrors((previous) => ({
        ...previous,
        [field]: `Enter ${field === "span" ? "a span" : "an inboard"} between ${range.min} and ${range.max} cm.`,
      }));
      return;
    }
    setValues((previous) => ({ ...previous, [field]: value }));
    setErrors((previous) => ({ ...previous, [field]: undefined }));
  }

  const { span, inboard } = values;
  const protocolOverlap = overlapCm("sculling", inboard, span, halfSwivelCm);
  const simpleOverlap = simpleOverlapCm("sculling", inboard, span);

  // Where the drawing puts things: pins half a span either side of the centre line; by the protocol's
  // convention each handle end reaches inboard + half swivel width past its pin.
  const xLeftPin = CENTRE_X - (span / 2) * UNITS_PER_CM;
  const xRightPin = CENTRE_X + (span / 2) * UNITS_PER_CM;
  const reach = (inboard + halfSwivelCm) * UNITS_PER_CM;
  const xLeftHandleEnd = xLeftPin + reach;
  const xRightHandleEnd = xRightPin - reach;
  const grip = GRIP_CM * UNITS_PER_CM;
  const swivelHalf = halfSwivelCm * UNITS_PER_CM;
  const bracketFrom = Math.min(xLeftHandleEnd, xRightHandleEnd);
  const bracketTo = Math.max(xLeftHandleEnd, xRightHandleEnd);
  const overlaps = protocolOverlap > 0;
  const overlapLabel = overlaps
    ? `overlap ${formatCm(protocolOverlap)} cm`
    : protocolOverlap === 0
      ? "handle ends just meet"
      : `gap ${formatCm(-protocolOverlap)} cm`;

  const convention = `measurement protocol: 2 × (inboard + half swivel width) − span, half swivel ${formatCm(halfSwivelCm)} cm`;
  const titleId = `${id}-title`;
  const descId = `${id}-desc`;

  return (
    <section aria-labelledby={`${id}-heading`} className="my-6 rounded-lg border border-slate-300 bg-white p-4 text-slate-900">
      <h3 id={`${id}-heading`} className="text-lg font-semibold">
        Span and overlap
      </h3>
      <p className="mt-2 text-base leading-7 text-slate-800">
        Seen from above with the sculls square to the boat. Change the span or the inboard and watch where the handle ends finish.
      </p>

      <div className="mt-4 grid gap-4 sm:grid-cols-2">
        <NumberField
          id={`${id}-span`}
          label="Span"
          range={SPAN_RANGE}
          value={span}
          text={texts.span}
          error={errors.span}
          disabled={!hydrated}
          onSlide={(value) => slide("span", value)}
          onType={(text) => typeIn("span", text)}
        />
        <NumberField
          id={`${id}-inboard`}
          label="Inboard"
          range={INBOARD_RANGE}
          value={inboard}
          text={texts.inboard}
          error={errors.inboard}
          disabled={!hydrated}
          onSlide={(value) => slide("inboard", value)}
          onType={(text) => typeIn("inboard", text)}
        />
      </div>

      <svg
        role="img"
        aria-labelledby={`${titleId} ${descId}`}
        viewBox={`0 0 ${WIDTH} ${HEIGHT}`}
        className="mt-4 h-auto w-full max-w-xl"
        fontFamily="inherit"
      >
        <title id={titleId}>Two sculls crossing over the boat&apos;s centre line</title>
        <desc id={descId}>
          {`Top view of a sculling boat. The pins are ${formatCm(span)} cm apart. Each scull has an inboard of ${formatCm(inboard)} cm. ` +
            (overlaps
              ? `The handle ends pass each other over the centre line by ${formatCm(protocolOverlap)} cm (${convention}).`
              : `The handle ends do not pass each other (${overlapLabel}, ${convention}).`)}
        </desc>

        <path d={hullPath()} className="fill-slate-100 stroke-slate-400" strokeWidth={1.5} />
        <g className="text-slate-600">
          <line x1={CENTRE_X} x2={CENTRE_X} y1={6} y2={214} stroke="currentColor" strokeWidth={1.5} strokeDasharray="6 4" />
          <text x={CENTRE_X + 6} y={16} fontSize={13} fill="currentColor" {...HALO}>
            centre line
          </text>
        </g>

        {/* Riggers, swivels and pins */}
        <g className="text-slate-500">
          <line x1={CENTRE_X - HULL_HALF_WIDTH} x2={xLeftPin} y1={Y_RIGGER} y2={Y_RIGGER} stroke="currentColor" strokeWidth={2.5} />
          <line x1={CENTRE_X + HULL_HALF_WIDTH} x2={xRightPin} y1={Y_RIGGER} y2={Y_RIGGER} stroke="currentColor" strokeWidth={2.5} />
          {[xLeftPin, xRightPin].map((x) => (
            <g key={x}>
              <rect
                x={x - swivelHalf}
                y={Y_RIGGER - 16}
                width={swivelHalf * 2}
                height={32}
                rx={1.5}
                className="fill-slate-300"
                stroke="currentColor"
              />
              <circle cx={x} cy={Y_RIGGER} r={3} className="fill-slate-900" />
            </g>
          ))}
          <text x={xLeftPin} y={Y_RIGGER + 30} textAnchor="middle" fontSize={13} className="fill-slate-900">
            pin
          </text>
          <text x={xRightPin} y={Y_RIGGER + 30} textAnchor="middle" fontSize={13} className="fill-slate-900">
            pin
          </text>
        </g>

        {/* The sculls: shafts run off the picture towards the blades; handles drawn thicker. */}
        <g className="text-slate-800">
          <line x1={0} x2={xLeftHandleEnd - grip} y1={Y_LEFT_SCULL} y2={Y_LEFT_SCULL} stroke="currentColor" strokeWidth={4} />
          <line
            x1={xLeftHandleEnd - grip}
            x2={xLeftHandleEnd}
            y1={Y_LEFT_SCULL}
            y2={Y_LEFT_SCULL}
            stroke="currentColor"
            strokeWidth={9}
            strokeLinecap="round"
          />
          <line x1={WIDTH} x2={xRightHandleEnd + grip} y1={Y_RIGHT_SCULL} y2={Y_RIGHT_SCULL} stroke="currentColor" strokeWidth={4} />
          <line
            x1={xRightHandleEnd + grip}
            x2={xRightHandleEnd}
            y1={Y_RIGHT_SCULL}
            y2={Y_RIGHT_SCULL}
            stroke="currentColor"
            strokeWidth={9}
            strokeLinecap="round"
          />
        </g>

        {/* The overlap (or gap) between the two handle ends */}
        <g className={overlaps ? "text-river-700" : "text-signal-800"}>
          <line
            x1={xLeftHandleEnd}
            x2={xLeftHandleEnd}
            y1={Y_LEFT_SCULL + 6}
            y2={Y_OVERLAP + 6}
            stroke="currentColor"
            strokeDasharray="3 3"
          />
          <line
            x1={xRightHandleEnd}
            x2={xRightHandleEnd}
            y1={Y_RIGHT_SCULL + 6}
            y2={Y_OVERLAP + 6}
            stroke="currentColor"
            strokeDasharray="3 3"
          />
          <line x1={bracketFrom} x2={bracketTo} y1={Y_OVERLAP} y2={Y_OVERLAP} stroke="currentColor" strokeWidth={3} />
          <text x={CENTRE_X} y={Y_OVERLAP + 24} textAnchor="middle" fontSize={15} fontWeight={700} fill="currentColor" {...HALO}>
            {overlapLabel}
          </text>
        </g>

        {/* Span: pin to pin */}
        <g className="text-slate-700">
          <line x1={xLeftPin} x2={xRightPin} y1={Y_SPAN} y2={Y_SPAN} stroke="currentColor" strokeWidth={1.5} />
          <polygon points={`${xLeftPin},${Y_SPAN} ${xLeftPin + 7},${Y_SPAN - 3.5} ${xLeftPin + 7},${Y_SPAN + 3.5}`} fill="currentColor" />
          <polygon
            points={`${xRightPin},${Y_SPAN} ${xRightPin - 7},${Y_SPAN - 3.5} ${xRightPin - 7},${Y_SPAN + 3.5}`}
            fill="currentColor"
          />
          <text x={CENTRE_X - 34} y={Y_SPAN - 6} textAnchor="end" fontSize={14} fill="currentColor" {...HALO}>
            span {formatCm(span)} cm
          </text>
        </g>
      </svg>

      <div
        role="status"
        aria-live="polite"
        className="mt-4 rounded-md border-l-4 border-river-600 bg-river-50 px-4 py-3 text-base leading-7 text-slate-900"
      >
        <p className="font-semibold">
          Overlap: {formatSignedCm(protocolOverlap)} cm
          {overlaps
            ? ""
            : protocolOverlap === 0
              ? " (the handle ends just meet)"
              : ` (the handle ends miss each other by ${formatCm(-protocolOverlap)} cm)`}
        </p>
        <p className="mt-1">
          Convention: {convention}. Here: 2 × ({formatCm(inboard)} + {formatCm(halfSwivelCm)}) − {formatCm(span)} ={" "}
          {formatSignedCm(protocolOverlap)} cm.
        </p>
        <p className="mt-1">
          Simple figure (no swivel): 2 × {formatCm(inboard)} − {formatCm(span)} = {formatSignedCm(simpleOverlap)} cm. Always say which one
          you mean.
        </p>
      </div>
      <noscript>
        <p className="mt-3 text-sm text-slate-700">
          The sliders need JavaScript. The picture and numbers above show a span of {formatCm(defaultSpanCm)} cm with an inboard of{" "}
          {formatCm(defaultInboardCm)} cm.
        </p>
      </noscript>
    </section>
  );
}
