"use client";

export const STEP_TITLES = ["You", "Riding", "Bike", "Feel", "Review"] as const;

/** Steps already reached are buttons, so the rider can go back (or forward again) to any of them. */
export function StepIndicator({
  step,
  reached,
  onGo,
}: {
  step: number;
  reached: number;
  onGo: (step: number) => void;
}) {
  return (
    <nav aria-label="Form steps">
      <ol className="grid grid-cols-5 gap-1">
        {STEP_TITLES.map((title, i) => {
          const current = i === step;
          const base =
            "flex min-h-12 w-full flex-col items-center justify-center rounded-lg px-1 text-xs font-semibold leading-tight";
          const number = (
            <span className="text-base">
              <span className="sr-only">Step </span>
              {i + 1}
              <span className="sr-only">: </span>
            </span>
          );
          return (
            <li key={title}>
              {current ? (
                <span aria-current="step" className={`${base} bg-pine-700 text-white`}>
                  {number}
                  {title}
                </span>
              ) : i <= reached ? (
                <button
                  type="button"
                  onClick={() => onGo(i)}
                  className={`${base} border border-pine-700 bg-white text-pine-800 hover:bg-pine-50`}
                >
                  {number}
                  {title}
                  <span className="sr-only"> (go to this step)</span>
                </button>
              ) : (
                <span className={`${base} border border-stone-300 text-stone-600`}>
                  {number}
                  {title}
                  <span className="sr-only"> (not reached yet)</span>
                </span>
              )}
            </li>
          );
        })}
      </ol>
    </nav>
  );
}
