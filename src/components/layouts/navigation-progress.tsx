import { useNavigation } from 'react-router-dom';

/** A thin bar at the top while the next page's data loads, so a tap visibly did something. */
export function NavigationProgress() {
  const navigation = useNavigation();
  if (navigation.state === 'idle') return null;
  return (
    <div
      role="progressbar"
      aria-label="Loading page"
      className="fixed inset-x-0 top-0 z-50 h-1 overflow-hidden bg-straw-100"
    >
      <div className="h-full w-1/3 animate-[hourstone-progress_1.1s_ease-in-out_infinite] bg-straw-500" />
    </div>
  );
}
