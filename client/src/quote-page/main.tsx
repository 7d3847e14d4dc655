// The homeowner's public quote page (`/q/<token>`): its own small bundle, apart from the staff app.
// Only the fonts, Mantine styles and components the page uses are loaded; nothing from a CDN.
import '@fontsource/inter/latin-400.css';
import '@fontsource/inter/latin-600.css';
import '@mantine/core/styles/baseline.css';
import '@mantine/core/styles/default-css-variables.css';
import '@mantine/core/styles/global.css';
import '@mantine/core/styles/UnstyledButton.css';
import '@mantine/core/styles/Button.css';
import '@mantine/core/styles/Loader.css';
import '@mantine/core/styles/Paper.css';
import '@mantine/core/styles/Container.css';
import '@mantine/core/styles/Stack.css';
import '@mantine/core/styles/Group.css';
import '@mantine/core/styles/SimpleGrid.css';
import '@mantine/core/styles/Title.css';
import '@mantine/core/styles/Text.css';
import '@mantine/core/styles/Anchor.css';
import '@mantine/core/styles/Badge.css';
import '@mantine/core/styles/List.css';
import '@mantine/core/styles/Divider.css';
import '@mantine/core/styles/Alert.css';
import '@mantine/core/styles/Input.css';
import '@mantine/core/styles/InlineInput.css';
import '@mantine/core/styles/Checkbox.css';
import './quote-page.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { createQuoteQueryClient, quoteQueryOptions } from './api/quote-queries';
import { tokenFromPath } from './lib/location';
import { QuotePage } from './quote-page';
import { QuoteProviders } from './quote-providers';

const root = document.getElementById('root');
if (!root) throw new Error('The page has no #root element');

// The quote is asked for now, while React renders the loading state, not after that render: the
// quote is the page's largest paint, and it waits for this answer.
const queryClient = createQuoteQueryClient();
const token = tokenFromPath(window.location.pathname);
if (token) void queryClient.prefetchQuery(quoteQueryOptions(token));

createRoot(root).render(
  <StrictMode>
    <QuoteProviders queryClient={queryClient}>
      <QuotePage pathname={window.location.pathname} search={window.location.search} />
    </QuoteProviders>
  </StrictMode>,
);
