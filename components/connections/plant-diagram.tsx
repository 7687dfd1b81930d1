import { useRouter } from 'expo-router';
import { useEffect, useMemo, useState } from 'react';
import { StyleSheet, View, useWindowDimensions } from 'react-native';
import Svg, { Path, Polygon } from 'react-native-svg';
import { colors, radius, space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { DiagramLegend } from '@/components/connections/diagram-legend';
import { NODE_SIZE, layoutDiagram, type PlacedLink } from '@/components/connections/diagram-layout';
import { DiagramNode } from '@/components/connections/diagram-node';
import { MEDIUM_LINES } from '@/components/connections/connection-vocabulary';
import { fitView, startView, transformFor, usePanZoom } from '@/components/connections/use-pan-zoom';
import type { PlantRoomDiagram } from '@/shared/types/connections';

const ARROW = 9;

function LinkLine({ link }: { link: PlacedLink }) {
  const pts = link.points;
  if (pts.length < 2) return null;
  const look = MEDIUM_LINES[link.medium];
  const d = pts.map((p, i) => `${i ? 'L' : 'M'}${p.x} ${p.y}`).join(' ');
  // An arrowhead at the supplied end shows the drawn direction.
  const [a, b] = [pts[pts.length - 2], pts[pts.length - 1]];
  const len = Math.hypot(b.x - a.x, b.y - a.y) || 1;
  const [ux, uy] = [(b.x - a.x) / len, (b.y - a.y) / len];
  const head = [[b.x, b.y], [b.x - ux * ARROW - uy * ARROW * 0.6, b.y - uy * ARROW + ux * ARROW * 0.6], [b.x - ux * ARROW + uy * ARROW * 0.6, b.y - uy * ARROW - ux * ARROW * 0.6]];
  return (
    <>
      <Path d={d} stroke={look.stroke} strokeWidth={2.5} strokeDasharray={look.dash} fill="none" />
      <Polygon points={head.map((p) => p.join(',')).join(' ')} fill={look.stroke} />
    </>
  );
}

/** The room drawn from its connections: drag to pan, pinch or the buttons to zoom, tap an item to open it. */
export function PlantDiagram({ diagram, focusId }: { diagram: PlantRoomDiagram; focusId?: number }) {
  const router = useRouter();
  const { height: windowHeight } = useWindowDimensions();
  const placed = useMemo(() => layoutDiagram(diagram), [diagram]);
  const [frame, setFrame] = useState({ w: 0, h: Math.max(360, Math.round(windowHeight * 0.62)) });
  const { view, setView, zoom, handlers } = usePanZoom({ x: 0, y: 0, k: 1 });
  const fit = () => setView(fitView(placed.width, placed.height, frame.w, frame.h));
  const focus = placed.items.find((p) => p.item.id === focusId);
  const focusPoint = focus ? { x: focus.x + NODE_SIZE.width / 2, y: focus.y + NODE_SIZE.height / 2 } : undefined;
  useEffect(() => { if (frame.w) setView(startView(placed.width, frame.w, frame.h, focusPoint)); }, [frame.w, placed, focusId]); // eslint-disable-line react-hooks/exhaustive-deps

  if (!diagram.connections.length) {
    return <Text muted>No connections are recorded for this room yet. Add them on each item’s record (“Supplied from”, “Supplies”).</Text>;
  }
  return (
    <View style={{ gap: space.sm }}>
      <View style={styles.controls}>
        <Button title="Zoom in" variant="secondary" onPress={() => zoom(1.4, frame.w / 2, frame.h / 2)} testID="diagram-zoom-in" />
        <Button title="Zoom out" variant="secondary" onPress={() => zoom(1 / 1.4, frame.w / 2, frame.h / 2)} testID="diagram-zoom-out" />
        <Button title="Fit" variant="secondary" onPress={fit} testID="diagram-fit" />
      </View>
      <View
        style={[styles.frame, { height: frame.h }]}
        onLayout={(e) => setFrame((f) => ({ ...f, w: Math.round(e.nativeEvent.layout.width) }))}
        testID="plant-diagram"
        {...handlers}
      >
        <View style={{ position: 'absolute', left: 0, top: 0, width: placed.width, height: placed.height, transform: transformFor(view, placed.width, placed.height) }}>
          <Svg width={placed.width} height={placed.height} style={StyleSheet.absoluteFill}>
            {placed.links.map((l) => <LinkLine key={l.id} link={l} />)}
          </Svg>
          {placed.items.map((p) => <DiagramNode key={p.item.id} placed={p} onOpen={(id) => router.push(`/assets/${id}`)} />)}
        </View>
      </View>
      <Text variant="small" muted>{`Drag to move, pinch or use the buttons to zoom. ${Math.round(view.k * 100)} %.`}</Text>
      <DiagramLegend diagram={diagram} />
    </View>
  );
}

const styles = StyleSheet.create({
  controls: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  frame: { overflow: 'hidden', borderWidth: 1, borderColor: colors.line, borderRadius: radius.lg, backgroundColor: colors.paper, touchAction: 'none' } as object,
});
