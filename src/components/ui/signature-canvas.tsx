import { useEffect, useRef } from "react";
import SignaturePad from "signature_pad";
import { Button } from "@/components/ui/button";
import { cn } from "@/lib/cn";

export interface SignatureCanvasProps {
  /** The accessible name of the drawing area. */
  label: string;
  /** Called after each stroke with the PNG data URL, and with null when cleared. */
  onChange: (pngDataUrl: string | null) => void;
  className?: string;
}

/**
 * A finger- or mouse-drawn signature (signature_pad on a canvas). The canvas is sized to its box
 * times the screen's pixel ratio (at most 2, so the PNG stays small); when the box changes size the
 * strokes are redrawn from their points. Keyboard users sign by typing instead: the
 * caller always offers that choice.
 */
export function SignatureCanvas({ label, onChange, className }: SignatureCanvasProps) {
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const padRef = useRef<SignaturePad | null>(null);
  const onChangeRef = useRef(onChange);
  useEffect(() => {
    onChangeRef.current = onChange;
  });

  useEffect(() => {
    const canvas = canvasRef.current;
    if (!canvas) return;
    const pad = new SignaturePad(canvas, { penColor: "#171C24", minWidth: 0.8, maxWidth: 2.6 });
    padRef.current = pad;
    const onEnd = () => onChangeRef.current(pad.isEmpty() ? null : pad.toDataURL("image/png"));
    pad.addEventListener("endStroke", onEnd);
    let lastWidth = 0;
    const resize = () => {
      const width = canvas.offsetWidth;
      if (width === lastWidth || width === 0) return;
      lastWidth = width;
      const ratio = Math.min(Math.max(window.devicePixelRatio || 1, 1), 2);
      canvas.width = width * ratio;
      canvas.height = canvas.offsetHeight * ratio;
      canvas.getContext("2d")?.scale(ratio, ratio);
      // Redraw what was signed (a phone turning, a scrollbar appearing) rather than lose it.
      const strokes = pad.toData();
      pad.clear();
      if (strokes.length > 0) pad.fromData(strokes);
      onChangeRef.current(pad.isEmpty() ? null : pad.toDataURL("image/png"));
    };
    resize();
    const observer = new ResizeObserver(resize);
    observer.observe(canvas);
    return () => {
      observer.disconnect();
      pad.removeEventListener("endStroke", onEnd);
      pad.off();
      padRef.current = null;
    };
  }, []);

  return (
    <div className={cn("space-y-2", className)}>
      <div className="relative rounded-md border-2 border-dashed border-ink-400 bg-white">
        <canvas ref={canvasRef} role="img" aria-label={label} data-signature-canvas className="block h-40 w-full touch-none rounded-md sm:h-44" />
        <div aria-hidden="true" className="pointer-events-none absolute inset-x-4 bottom-9 border-b border-ink-300" />
        <span aria-hidden="true" className="pointer-events-none absolute bottom-3 left-4 text-sm text-ink-500">
          Sign above the line
        </span>
      </div>
      <Button
        variant="secondary"
        size="sm"
        onClick={() => {
          padRef.current?.clear();
          onChangeRef.current(null);
        }}
      >
        Clear the drawing
      </Button>
    </div>
  );
}
