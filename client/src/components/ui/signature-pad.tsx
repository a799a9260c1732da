import { useEffect, useId, useRef, type PointerEvent } from 'react';
import { Button } from './button';
import { FieldError } from './field';

export interface SignaturePadProps {
  onChange: (dataUrl: string | null) => void;
  label: string;
  clearLabel: string;
  // Said beside the pad when a drawn signature is required and missing.
  error?: string;
}

// A small canvas signed with a finger or a mouse; the drawing goes to the report as a PNG data URL.
export function SignaturePad({ onChange, label, clearLabel, error }: SignaturePadProps) {
  const id = useId();
  const labelId = `${id}-label`;
  const errorId = `${id}-error`;
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const drawing = useRef(false);
  const drawn = useRef(false);

  useEffect(() => {
    const canvas = canvasRef.current;
    const context = canvas?.getContext('2d');
    if (!canvas || !context) return;
    context.lineWidth = 3;
    context.lineCap = 'round';
    context.strokeStyle = '#000000';
  }, []);

  const point = (event: PointerEvent<HTMLCanvasElement>) => {
    const canvas = event.currentTarget;
    const box = canvas.getBoundingClientRect();
    return {
      x: ((event.clientX - box.left) / box.width) * canvas.width,
      y: ((event.clientY - box.top) / box.height) * canvas.height,
    };
  };

  const down = (event: PointerEvent<HTMLCanvasElement>) => {
    const context = event.currentTarget.getContext('2d');
    if (!context) return;
    event.currentTarget.setPointerCapture?.(event.pointerId);
    drawing.current = true;
    const { x, y } = point(event);
    context.beginPath();
    context.moveTo(x, y);
  };

  const move = (event: PointerEvent<HTMLCanvasElement>) => {
    if (!drawing.current) return;
    const context = event.currentTarget.getContext('2d');
    if (!context) return;
    const { x, y } = point(event);
    context.lineTo(x, y);
    context.stroke();
    drawn.current = true;
  };

  const up = (event: PointerEvent<HTMLCanvasElement>) => {
    if (!drawing.current) return;
    drawing.current = false;
    if (drawn.current) onChange(event.currentTarget.toDataURL('image/png'));
  };

  const clear = () => {
    const canvas = canvasRef.current;
    canvas?.getContext('2d')?.clearRect(0, 0, canvas.width, canvas.height);
    drawn.current = false;
    onChange(null);
  };

  return (
    <div className="flex flex-col gap-2">
      <p className="font-bold" id={labelId}>
        {label}
      </p>
      {/* White like paper in every theme, so the ink shows and the PNG reads on the report. The error
          is told through the description: an img cannot carry aria-invalid. */}
      <canvas
        ref={canvasRef}
        width={600}
        height={200}
        // A canvas is a picture to assistive technology; this one is the drawn signature, named by the label.
        // eslint-disable-next-line jsx-a11y-x/no-interactive-element-to-noninteractive-role
        role="img"
        aria-labelledby={labelId}
        aria-describedby={error ? errorId : undefined}
        data-testid="signature-pad"
        className={`h-40 w-full touch-none rounded-lg bg-white ${error ? 'border-4 border-danger' : 'border-2 border-line'}`}
        onPointerDown={down}
        onPointerMove={move}
        onPointerUp={up}
        onPointerLeave={up}
      />
      <FieldError id={errorId} message={error} />
      <div>
        <Button variant="secondary" onClick={clear}>
          {clearLabel}
        </Button>
      </div>
    </div>
  );
}
