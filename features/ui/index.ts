export { colors, fonts, space, radius } from './theme';
export { breakpointFor, useBreakpoint, WIDE_MIN_WIDTH, type Breakpoint } from './hooks/use-breakpoint';
export { AppProviders } from './components/app-providers';
export { ScreenFrame } from './components/screen-frame';
export { ClientOnly } from './components/hydrated';
export { fetchJson, postJson, sendJson, ApiRequestError } from './api/fetch-json';
export { NotFoundScreen } from './components/not-found-screen';
export { ActionButton, Card, DebouncedTextInput, SectionTitle, ToggleChip } from './components/controls';
