// Registers every language of the message catalog (src/lib/server/i18n/catalog.ts), as the server does,
// so a component rendered in a test speaks English without its page's props.
import '@/lib/server/i18n/catalog';
