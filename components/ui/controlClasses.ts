// Shared look of text inputs, selects and text areas (44 px tall, clear invalid state).
export const controlClasses =
  'block w-full min-h-11 rounded-lg border border-ash-300 bg-white px-3 py-2 text-base text-ash-900 shadow-sm ' +
  'placeholder:text-ash-500 hover:border-ash-400 focus:border-spruce-500 focus:outline-2 focus:outline-offset-0 ' +
  'focus:outline-spruce-500/40 disabled:bg-ash-100 disabled:text-ash-600 ' +
  'aria-invalid:border-clay-500 aria-invalid:focus:outline-clay-500/40';
