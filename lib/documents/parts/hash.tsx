import { Text, View } from "@react-pdf/renderer";
import { FIGURES } from "../fonts";
import { styles } from "../theme";

/**
 * A SHA-256 as documents print it: whole, in the figures face, so it can be read out and
 * compared by eye; `split` puts it on two lines of 32 digits where the column is narrow.
 */
export function HashLines({ hash, size = 9, split = false }: { hash: string; size?: number; split?: boolean }) {
  const lines = split ? [hash.slice(0, 32), hash.slice(32)] : [hash];
  return (
    <>
      {lines.map((line, i) => (
        <Text key={i} style={{ fontFamily: FIGURES, fontSize: size, fontWeight: split ? 400 : 500, letterSpacing: split ? 0 : 0.3 }}>
          {line}
        </Text>
      ))}
    </>
  );
}

/** A labelled hash: "SNAPSHOT SHA-256" over its digits. */
export function HashBlock({ label, hash, size }: { label: string; hash: string; size?: number }) {
  return (
    <View style={{ marginBottom: 6 }}>
      <Text style={styles.label}>{label}</Text>
      <HashLines hash={hash} size={size} />
    </View>
  );
}
