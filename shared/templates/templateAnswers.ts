// How a template reads in the API's answers and on its pages: the gallery card, one published version, and the
// template page's whole view. The server builds them from its rows (src/server/templates/templateJson.ts, where
// the compiler checks the rows' value lists fit these); the pages' view components read them without reaching
// into the server.
import type { Units } from '../design/design.schema.ts';

export type TemplateVisibility = 'public' | 'class' | 'unlisted';
export type Difficulty = 'beginner' | 'intermediate' | 'advanced';

export interface TemplateCardJson {
  id: string;
  visibility: TemplateVisibility;
  latestVersion: number;
  versionId: string;
  owner: { id: string; displayName: string };
  title: string;
  description: string;
  difficulty: Difficulty;
  motifs: string[];
  size: { units: Units; width: number; height: number };
  figures: unknown;
  publishedAt: string;
}

export interface TemplateVersionJson {
  id: string;
  templateId: string;
  version: number;
  title: string;
  description: string;
  difficulty: Difficulty;
  motifs: string[];
  size: { units: Units; width: number; height: number };
  design: unknown;
  route: unknown;
  figures: unknown;
  publishedAt: string;
}

export interface TemplateDetail {
  template: TemplateCardJson;
  version: TemplateVersionJson;
  versions: { id: string; version: number; title: string; publishedAt: string }[];
  canEdit: boolean;
  /** Present for editors: the unguessable link that opens an unlisted template. */
  linkPath?: string;
}
