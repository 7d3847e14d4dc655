// The homeowner's public quote page (`/q/<token>`): its own small bundle, apart from the staff app.
// Plain React and CSS, not Mantine: a homeowner opens it once on a phone, and the staff app's component
// library would be most of what the phone downloads and runs first. Nothing from a CDN.
import '@fontsource/inter/latin-400.css';
import '@fontsource/inter/latin-600.css';
import './theme.css';
import './ui/ui.css';
import './quote-page.css';
// First of the modules with code: it starts the quote's request before React is evaluated.
import { takeEarlyQuote } from './early-quote';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { createQuoteQueryClient, quoteQueryOptions } from './api/quote-queries';
import { tokenFromPath } from './lib/location';
import { QuotePage } from './quote-page';
import { QuoteProviders } from './quote-providers';

const root = document.getElementById('root');
if (!root) throw new Error('The page has no #root element');

// The query takes over the request early-quote.ts started; retries and later checks ask again.
const queryClient = createQuoteQueryClient();
const token = tokenFromPath(window.location.pathname);
const options = token ? quoteQueryOptions(token) : null;
const firstAnswer = options
  ? queryClient.prefetchQuery({
      ...options,
      queryFn: (context) => takeEarlyQuote() ?? options.queryFn!(context),
    })
  : Promise.resolve();

function render() {
  createRoot(root!).render(
    <StrictMode>
      <QuoteProviders queryClient={queryClient}>
        <QuotePage pathname={window.location.pathname} search={window.location.search} />
      </QuoteProviders>
    </StrictMode>,
  );
}

// The HTML already shows the loading state. The quote's answer has usually arrived by the time this
// runs, so React's first render waits for it (at most FIRST_RENDER_WAIT_MS) and is the quote itself:
// rendering a loading screen first and then the quote cost a slow phone about a third of a second
// before the quote appeared (npm run bench:client).
const FIRST_RENDER_WAIT_MS = 400;
void Promise.race([
  firstAnswer,
  new Promise((resolve) => setTimeout(resolve, FIRST_RENDER_WAIT_MS)),
]).then(render);
