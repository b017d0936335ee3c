import type { Task } from '../api/types';

/** Parts, fluids, labour and instructions, folded away until asked for. */
export function TaskContents({ task, showSafetyNotes }: { task: Task; showSafetyNotes: boolean }) {
  const hasContents =
    task.parts.length > 0 ||
    task.fluids.length > 0 ||
    task.labourHours !== null ||
    task.instructions ||
    (showSafetyNotes && task.safetyNotes);
  if (!hasContents) return null;
  return (
    <details className="group rounded-lg border border-field-200">
      <summary className="flex min-h-touch cursor-pointer items-center px-3 font-bold text-field-800">
        Parts, fluids and instructions
      </summary>
      <div className="flex flex-col gap-3 border-t border-field-200 p-3">
        {task.parts.length > 0 ? (
          <div>
            <h4 className="font-bold text-field-900">Parts</h4>
            <ul className="list-disc pl-5">
              {task.parts.map((part, i) => (
                <li key={i}>
                  {part.quantity} × {part.partNumber || part.description}
                  {part.partNumber && part.description ? ` — ${part.description}` : ''}
                  {part.wearPart ? ' (wear part: inspect, replace when worn)' : ''}
                  {part.filterRole ? ' (number from the spec sheet)' : ''}
                </li>
              ))}
            </ul>
          </div>
        ) : null}
        {task.fluids.length > 0 ? (
          <div>
            <h4 className="font-bold text-field-900">Fluids</h4>
            <ul className="list-disc pl-5">
              {task.fluids.map((fluid, i) => (
                <li key={i}>
                  {fluid.volume} {fluid.unit} {fluid.kind}
                  {fluid.capacity ? ' (from the spec sheet)' : ''}
                </li>
              ))}
            </ul>
          </div>
        ) : null}
        {task.labourHours !== null ? (
          <p>
            <span className="font-bold">Estimated labour:</span> {task.labourHours} h
          </p>
        ) : null}
        {task.instructions ? (
          <div>
            <h4 className="font-bold text-field-900">Instructions</h4>
            <p className="whitespace-pre-line">{task.instructions}</p>
          </div>
        ) : null}
        {showSafetyNotes && task.safetyNotes ? (
          <div>
            <h4 className="font-bold text-field-900">Safety notes</h4>
            <p className="whitespace-pre-line">{task.safetyNotes}</p>
          </div>
        ) : null}
      </div>
    </details>
  );
}
