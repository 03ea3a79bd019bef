import { useQueryClient } from "@tanstack/react-query";
import { Link, useNavigate } from "react-router-dom";
import { Card, CardBody } from "../../../components/ui/card";
import { PageHeader } from "../../../components/ui/page-header";
import { mapKeys } from "../../../features/maps/api/map-queries";
import { useImportMap } from "../../../features/review/api/review-mutations";
import { ImportForm } from "../../../features/review/components/import-form";

/** Recreate a map from a manifest (a map's export.json): the same manifest and seed give the same cells. */
export function ImportMapPage() {
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const create = useImportMap(async (map) => {
    queryClient.setQueryData(mapKeys.detail(map.id), map);
    await queryClient.invalidateQueries({ queryKey: mapKeys.lists() });
    navigate(`/maps/${map.id}`);
  });
  return (
    <>
      <nav aria-label="Breadcrumb" className="mb-3 text-sm">
        <Link to="/" className="text-well-600 hover:underline">Maps</Link>
        <span className="mx-1.5 text-ink-faint">/</span>
        <span className="text-ink-soft">Import a manifest</span>
      </nav>
      <PageHeader
        title="Import a map from its manifest"
        description="Every map's export.json carries a manifest with all its settings and its seed. Importing it recreates the map exactly; cells already stored are reused at once."
      />
      <Card className="max-w-3xl">
        <CardBody>
          <ImportForm busy={create.isPending} error={create.error} onSubmit={(body) => create.mutate(body)} />
        </CardBody>
      </Card>
    </>
  );
}
