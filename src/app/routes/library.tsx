import { Page } from '../../components/page';
import { TemplateLibrary } from '../../features/library/components/template-library';

export function LibraryRoute() {
  return (
    <Page
      title="Template library"
      lead="Each template is one mechanism, solved for the sizes and loads you give it: the force in every pin, link and jaw, its free-body diagrams, design checks and cautions."
    >
      <TemplateLibrary />
    </Page>
  );
}
