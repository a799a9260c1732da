import { useTranslation } from 'react-i18next';

// The first stop for the keyboard on every page: straight past the header to the page's <main id="main">.
export function SkipToMain() {
  const { t } = useTranslation();
  return (
    <a
      href="#main"
      className="sr-only focus:not-sr-only focus:m-2 focus:inline-flex focus:min-h-tap focus:items-center focus:px-3"
    >
      {t('nav.skip')}
    </a>
  );
}
