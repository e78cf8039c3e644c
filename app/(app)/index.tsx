import { useEffect, useRef, useState } from "react";
import { router, useLocalSearchParams } from "expo-router";
import { Pressable, StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { CasebookEmptyState } from "@/components/search/casebook-empty-state";
import { CasebookFilterChips } from "@/components/search/casebook-filter-chips";
import {
  activeCount,
  CASEBOOK_PAGE_SIZE,
  NO_FILTERS,
  searchRequestFor,
  viewFromParams,
  viewToParams,
  type CasebookFilters,
  type CasebookView,
  type RouteParams,
} from "@/lib/casebook-filters";
import { CasebookResultCard } from "@/components/search/casebook-result-card";
import { CasebookResultTable } from "@/components/search/casebook-result-table";
import { CasebookSearchBox } from "@/components/search/casebook-search-box";
import { ChoiceChips } from "@/components/ui/choice-chips";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { Pager } from "@/components/ui/pager";
import { Loading } from "@/components/ui/query-state";
import { Screen } from "@/components/ui/screen";
import { colors, fontSize, space } from "@/constants/theme";
import { useIsWide } from "@/hooks/use-layout";
import { useCaseSearch, useDebounced } from "@/hooks/use-search";
import { useShopMembers } from "@/hooks/use-shop";
import type { ApiError } from "@/lib/api";
import { groupThousands } from "@/rules/quantity-text";
import type { SearchAnswer, SearchSort } from "@/lib/search-schemas";

/** The casebook: every case the shop has judged, found by words (typos forgiven) and filters. */
export default function CasebookScreen() {
  const wide = useIsWide();
  // The words, filters, order and page live in the URL; only the words being typed are local.
  const view = viewFromParams(useLocalSearchParams() as RouteParams);
  const { filters, page } = view;
  const [text, setText] = useState(view.words);
  const words = useDebounced(text.trim(), 250);
  /** A new question starts again at page 1: the page belongs to the question asked. */
  const show = (next: Partial<CasebookView>) => router.setParams(viewToParams({ ...view, page: 1, ...next }));
  const setFilters = (f: CasebookFilters) => show({ filters: f });
  const setSort = (s: SearchSort) => show({ sort: s });
  const written = useRef(view.words);
  useEffect(() => {
    // Only settled typing writes the URL; `show` reads the current view each render.
    if (words === view.words) return;
    written.current = words;
    show({ words });
  }, [words]);
  useEffect(() => {
    // Back, forward or a followed link changed the words (not our own typing): show them in the box.
    if (view.words !== written.current) setText((written.current = view.words));
  }, [view.words]);
  const [showFilters, setShowFilters] = useState(wide);
  const members = useShopMembers();
  const query = searchRequestFor(view);
  const search = useCaseSearch(query);
  const answer = search.data;
  const active = activeCount(filters);
  const order = [
    ...(view.words ? [{ value: "relevance", label: "best match" }] : []),
    { value: "date-desc", label: "newest" },
    { value: "date-asc", label: "oldest" },
  ];
  const error = search.error as ApiError | null;

  const filterPanel = showFilters ? (
    <CasebookFilterChips
      filters={filters}
      onChange={setFilters}
      facets={answer?.facets}
      sampled={answer && !answer.facetsExact ? answer.countLimit : undefined}
      people={members.data ?? []}
      narrow={wide}
    />
  ) : null;
  const results = (
    <View style={styles.results}>
      {answer && answer.total > 1 ? (
        <ChoiceChips label="Order" options={order} value={answer.sort} onChange={(v) => setSort(v as SearchSort)} />
      ) : null}
      {error ? <Notice tone="error">{[error.message, ...Object.values(error.fields ?? {})].join(" ")}</Notice> : null}
      {search.isPending ? <Loading /> : null}
      {answer && answer.total === 0 ? (
        <CasebookEmptyState
          query={query}
          filtered={active > 0}
          onClearFilters={() => setFilters(NO_FILTERS)}
          onClearWords={() => setText("")}
        />
      ) : null}
      {answer && answer.items.length ? (
        wide ? (
          <CasebookResultTable hits={answer.items} sort={answer.sort} onSort={setSort} />
        ) : (
          answer.items.map((hit) => <CasebookResultCard key={hit.id} hit={hit} />)
        )
      ) : null}
      {answer && answer.total > CASEBOOK_PAGE_SIZE ? (
        <Pager
          page={page}
          pageSize={CASEBOOK_PAGE_SIZE}
          total={answer.total}
          atLeast={!answer.totalExact}
          hasNext={answer.next !== null}
          onPage={(n) => show({ page: n })}
        />
      ) : null}
    </View>
  );

  return (
    <Screen wide={wide}>
      <Heading>Casebook</Heading>
      <CasebookSearchBox value={text} onChange={setText} busy={search.isFetching || text.trim() !== words} />
      <View style={styles.bar}>
        <Pressable
          role="button"
          aria-expanded={showFilters}
          onPress={() => setShowFilters(!showFilters)}
          style={styles.toggle}
        >
          <Text style={styles.toggleText}>
            {showFilters ? "Hide filters" : "Filters"}
            {active ? ` (${active} on)` : ""}
          </Text>
        </Pressable>
        {active ? (
          <Pressable role="button" onPress={() => setFilters(NO_FILTERS)} style={styles.toggle}>
            <Text style={styles.toggleText}>Clear filters</Text>
          </Pressable>
        ) : null}
        {answer ? (
          <Text style={styles.count} testID="casebook-total">
            {casesText(answer)}
          </Text>
        ) : null}
      </View>
      {wide ? (
        <View style={styles.split}>
          {filterPanel ? <View style={styles.side}>{filterPanel}</View> : null}
          {results}
        </View>
      ) : (
        <>
          {filterPanel}
          {/* On a phone the chips push the results down: one tap closes them and shows what is left. */}
          {filterPanel && answer ? (
            <Button kind="plain" label={`Show ${casesText(answer)}`} onPress={() => setShowFilters(false)} />
          ) : null}
          {results}
        </>
      )}
    </Screen>
  );
}

/** Past the server's count limit the total is a lower bound: "1,000+ cases". */
const casesText = ({ total: n, totalExact }: Pick<SearchAnswer, "total" | "totalExact">) =>
  !totalExact
    ? `${groupThousands(n)}+ cases`
    : n === 0
      ? "no cases"
      : n === 1
        ? "1 case"
        : `${groupThousands(n)} cases`;

const styles = StyleSheet.create({
  bar: { flexDirection: "row", alignItems: "center", flexWrap: "wrap", gap: space.md },
  toggle: { minHeight: 40, justifyContent: "center" },
  toggleText: { fontSize: fontSize.body, fontWeight: "600", color: colors.steel, textDecorationLine: "underline" },
  count: { marginLeft: "auto", fontSize: fontSize.detail, color: colors.muted },
  split: { flexDirection: "row", alignItems: "flex-start", gap: space.xl },
  side: { width: 280 },
  results: { flex: 1, gap: space.md },
});
