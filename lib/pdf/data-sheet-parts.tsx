import "server-only";

import { Image, StyleSheet, Text, View } from "@react-pdf/renderer";

import type { BothUnits, DataSheetData, DataSheetOperation } from "@/lib/library/data-sheet-data";
import { inkFor } from "@/lib/ui/contrast";

import { pdfBase, pdfText as t } from "./pdf-kit";

// Parts shared by the sheet's data sheet and the cutter's data sheet.

export type Branding = { vendorName: string; accentColor: string; logo: { data: Buffer; format: "png" | "jpg" } | null };

export const ds = {
  ...pdfBase,
  ...StyleSheet.create({
    band: {
      flexDirection: "row",
      alignItems: "center",
      justifyContent: "space-between",
      paddingHorizontal: 10,
      paddingVertical: 6,
      marginBottom: 10,
      borderRadius: 3,
    },
    brand: { flexDirection: "row", alignItems: "center" },
    logo: { width: 24, height: 24, marginRight: 8, backgroundColor: "#ffffff", borderRadius: 2 },
    card: { borderWidth: 0.5, borderColor: "#a8a29e", borderRadius: 3, padding: 6 },
    cardTitle: { fontSize: 7, textTransform: "uppercase", color: "#57534e", marginBottom: 2 },
    bold: { fontWeight: "bold" },
    small: { fontSize: 7.5 },
    alt: { fontSize: 7, color: "#57534e" },
    footer: {
      position: "absolute",
      bottom: 16,
      left: 32,
      right: 32,
      fontSize: 7,
      color: "#57534e",
      flexDirection: "row",
      justifyContent: "space-between",
    },
  }),
};

export function BrandBand({ branding, label }: { branding: Branding; label: string }) {
  const ink = inkFor(branding.accentColor);
  return (
    <View style={[ds.band, { backgroundColor: branding.accentColor }]} fixed>
      <View style={ds.brand}>
        {/* eslint-disable-next-line jsx-a11y/alt-text -- react-pdf Image has no alt */}
        {branding.logo ? <Image style={ds.logo} src={branding.logo} /> : null}
        <Text style={[ds.bold, { color: ink, fontSize: 11 }]}>{t(branding.vendorName)}</Text>
      </View>
      <Text style={{ color: ink }}>{t(label)}</Text>
    </View>
  );
}

export function CutterSpecs({ cutter }: { cutter: DataSheetData["cutter"] }) {
  return (
    <View>
      <Text style={ds.bold}>{t(`${cutter.sku} · ${cutter.name}`)}</Text>
      <Text style={[ds.alt, { marginBottom: 3 }]}>{t(cutter.kind)}</Text>
      {cutter.specs.map((s) => (
        <View key={s.symbol} style={{ flexDirection: "row" }}>
          <Text style={[ds.small, { width: 92 }]}>{t(`${s.symbol} ${s.name}`)}</Text>
          <Text style={ds.small}>{t(typeof s.value === "string" ? s.value : `${s.value.metric} (${s.value.imperial})`)}</Text>
        </View>
      ))}
    </View>
  );
}

const COLUMNS: { key: keyof DataSheetOperation; label: string; width: string }[] = [
  { key: "label", label: "Operation", width: "20%" },
  { key: "n", label: "n", width: "9%" },
  { key: "vf", label: "vf", width: "13%" },
  { key: "fz", label: "fz", width: "15%" },
  { key: "ap", label: "ap", width: "9%" },
  { key: "ae", label: "ae", width: "13%" },
  { key: "plunge", label: "Plunge feed", width: "11%" },
  { key: "entry", label: "Entry", width: "10%" },
];

function Cell({ value }: { value: string | BothUnits | null }) {
  if (value === null) return <Text>—</Text>;
  if (typeof value === "string") return <Text>{t(value)}</Text>;
  return (
    <>
      <Text>{t(value.metric)}</Text>
      <Text style={ds.alt}>{t(value.imperial)}</Text>
    </>
  );
}

/** Each number in metric, with the imperial value under it. */
export function OperationsTable({ operations }: { operations: DataSheetOperation[] }) {
  return (
    <View style={{ fontSize: 8 }}>
      <View style={[ds.row, ds.th, { borderBottomWidth: 1, borderBottomColor: "#57534e" }]}>
        {COLUMNS.map((c) => (
          <Text key={c.key} style={{ width: c.width, paddingRight: 3 }}>
            {c.label}
          </Text>
        ))}
      </View>
      {operations.map((op, index) => (
        <View key={index} style={ds.row} wrap={false}>
          {COLUMNS.map((c) => (
            <View key={c.key} style={{ width: c.width, paddingRight: 3 }}>
              {c.key === "label" ? (
                <>
                  <Text style={ds.bold}>{t(op.label)}</Text>
                  {op.label !== op.kind ? <Text style={ds.alt}>{t(op.kind)}</Text> : null}
                  {op.notes ? <Text style={ds.alt}>{t(op.notes)}</Text> : null}
                </>
              ) : (
                <Cell value={op[c.key] as string | BothUnits | null} />
              )}
            </View>
          ))}
        </View>
      ))}
    </View>
  );
}

export function Cautions({ cautions, title = "Cautions" }: { cautions: string[]; title?: string }) {
  return (
    <View wrap={false}>
      <Text style={ds.h2}>{title}</Text>
      {cautions.map((c, i) => (
        <Text key={i} style={[ds.li, ds.small]}>
          {t(`⚠ ${c}`)}
        </Text>
      ))}
    </View>
  );
}

export function PageFooter({ left }: { left: string }) {
  return (
    <View style={ds.footer} fixed>
      <Text>{t(left)}</Text>
      <Text render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
    </View>
  );
}
